import type { Units } from '@shared/design/design.schema.ts';
import { useDesignDocument } from './useDesignDocument.ts';
import { Workbench } from './Workbench.tsx';

export interface DesignEditorProps {
  readonly designId: string;
  /** The viewer's unit choice; figures are written in it (the design keeps its own units for drawing). */
  readonly viewerUnits: Units;
}

/** The workbench island: loads the design, then shows the workbench (or why the design cannot be opened). */
export function DesignEditor({ designId, viewerUnits }: DesignEditorProps) {
  const doc = useDesignDocument(designId);
  if (doc.load.state === 'loading') return <p className="py-12 text-center">Opening the design…</p>;
  if (doc.load.state === 'missing' || !doc.design) {
    return (
      <div className="py-12 text-center" role="alert">
        <p className="text-xl font-semibold">This design could not be opened.</p>
        <p className="mt-2">{doc.load.state === 'missing' ? doc.load.message : ''}</p>
        <a href="/designs" className="mt-4 inline-block underline">Back to my designs</a>
      </div>
    );
  }
  return <Workbench designId={designId} doc={doc} design={doc.design} viewerUnits={viewerUnits} />;
}
