import type { DesignCommand } from '@shared/design/commands.ts';
import type { Design } from '@shared/design/design.schema.ts';
import { extensionGuide, halfwayGuide, type Guide } from '@shared/editor/guides.ts';
import type { Selection } from '@shared/editor/selectTool.ts';
import { joinShared, splitAtMiddle } from './tools/editCommands.ts';

export interface SelectionEdits {
  remove(): void;
  split(): void;
  join(): void;
  addGuide(): void;
}

export interface SelectionEditDeps {
  readonly design: Design;
  readonly selection: Selection | null;
  readonly setSelection: (s: Selection | null) => void;
  readonly dispatch: (cmd: DesignCommand) => void;
  readonly addGuideLine: (g: Guide) => void;
  /** Tells a screen reader (and the quilter) why nothing happened. */
  readonly announce: (message: string) => void;
}

/**
 * The edits that act on the pick: remove, split at the middle, join two lines that share an end (each one
 * undo step, dropping the pick), and a guide from one or two picked lines (view state, not undone).
 */
export function selectionEdits({ design, selection, setSelection, dispatch, addGuideLine, announce }: SelectionEditDeps): SelectionEdits {
  return {
    remove() {
      if (!selection) return;
      dispatch({ kind: 'deleteLines', target: selection.target, indices: selection.indices });
      setSelection(null);
    },
    split() {
      if (selection?.indices.length !== 1) return announce('Pick one line to split.');
      const cmd = splitAtMiddle(design, selection.target, selection.indices[0]!);
      if (cmd) dispatch(cmd);
      setSelection(null);
    },
    join() {
      if (selection?.indices.length !== 2) return announce('Pick two lines that share an end to join them.');
      const cmd = joinShared(design, selection.target, selection.indices[0]!, selection.indices[1]!);
      if (!cmd) return announce('These two lines do not share an end.');
      dispatch(cmd);
      setSelection(null);
    },
    addGuide() {
      if (!selection) return;
      const ends = (i: number): Guide | null => {
        const l = design[selection.target][i];
        return l && l.length >= 2 ? [l[0]!, l[l.length - 1]!] : null;
      };
      if (selection.indices.length === 2) {
        const a = ends(selection.indices[0]!);
        const b = ends(selection.indices[1]!);
        if (a && b) addGuideLine(halfwayGuide(a, b));
      } else if (selection.indices.length === 1) {
        const a = ends(selection.indices[0]!);
        const ext = a ? extensionGuide(a, design.width, design.height) : null;
        if (ext) addGuideLine(ext);
      }
    },
  };
}
