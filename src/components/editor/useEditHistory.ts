import { useCallback, useEffect, useRef, useState } from 'react';
import type { Design } from '@shared/design/design.schema.ts';
import type { DesignCommand } from '@shared/design/commands.ts';
import { canRedo, canUndo, createHistory, pushCommand, redo, undo, type History } from '@shared/design/history.ts';

export interface EditHistory {
  /** Applies a document command as one undo step. */
  dispatch(cmd: DesignCommand): void;
  undo(): void;
  redo(): void;
  readonly canUndo: boolean;
  readonly canRedo: boolean;
}

/**
 * Undo/redo over the shared history (shared/design/history.ts) for the design held by useDesignDocument.
 * Restarts empty whenever the document is replaced wholesale (`generation` changes: load, reload).
 */
export function useEditHistory(design: Design | null, setDesign: (d: Design) => void, generation: number): EditHistory {
  const [history, setHistory] = useState<History>(() => createHistory());
  const ref = useRef({ history, design });
  ref.current.design = design;

  useEffect(() => {
    const fresh = createHistory();
    ref.current.history = fresh;
    setHistory(fresh);
  }, [generation]);

  const run = useCallback((step: (h: History, d: Design) => { history: History; design: Design }) => {
    const { design: current, history: h } = ref.current;
    if (!current) return;
    const next = step(h, current);
    if (next.history === h) return;
    ref.current = { history: next.history, design: next.design };
    setHistory(next.history);
    setDesign(next.design);
  }, [setDesign]);

  return {
    dispatch: useCallback((cmd: DesignCommand) => run((h, d) => pushCommand(h, d, cmd)), [run]),
    undo: useCallback(() => run(undo), [run]),
    redo: useCallback(() => run(redo), [run]),
    canUndo: canUndo(history),
    canRedo: canRedo(history),
  };
}
