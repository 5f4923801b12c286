import type { DesignRecord } from '@shared/contract/designs.ts';
import type { Design } from '@shared/design/design.schema.ts';
import type { ServerCopy } from '@shared/editor/saveMachine.ts';

/** What the workbench saves: the drawing, its title and the notes it was loaded with (the save machine's document). */
export interface EditedDocument {
  readonly design: Design;
  readonly title: string;
  readonly notes: string;
}

/** The server's answer as the save machine's copy of the document at a version. */
export function serverCopyOf(record: DesignRecord): ServerCopy<EditedDocument> {
  return { version: record.version, doc: { design: record.design, title: record.title, notes: record.notes } };
}
