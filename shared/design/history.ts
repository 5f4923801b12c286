import type { Design } from './design.schema.ts';
import { applyCommand, type DesignCommand } from './commands.ts';

/** One undo step: the command as given and the inverse that undid it at the time. */
export interface HistoryEntry {
  readonly cmd: DesignCommand;
  readonly inverse: DesignCommand;
}

/**
 * Undo and redo stacks of document commands (most recent last). Only document edits enter history;
 * view state (tool, selection, zoom) never does, so a selection change leaves redo alone.
 */
export interface History {
  readonly undoStack: readonly HistoryEntry[];
  readonly redoStack: readonly HistoryEntry[];
  /** Most undo steps kept; the oldest are dropped beyond it. */
  readonly limit: number;
}

/** The outcome of a history operation: the new history and the design it leads to. */
export interface HistoryStep {
  readonly history: History;
  readonly design: Design;
}

/** An empty history keeping at most `limit` undo steps (default 500). */
export function createHistory(limit = 500): History {
  if (!(Number.isInteger(limit) && limit > 0)) throw new Error('design/history: limit must be a positive integer');
  return { undoStack: [], redoStack: [], limit };
}

/** Applies a new document command, records it for undo, and clears redo (a new edit forks the timeline). */
export function pushCommand(history: History, design: Design, cmd: DesignCommand): HistoryStep {
  const applied = applyCommand(design, cmd);
  const undoStack = [...history.undoStack, { cmd, inverse: applied.inverse }].slice(-history.limit);
  return { history: { ...history, undoStack, redoStack: [] }, design: applied.design };
}

export const canUndo = (history: History): boolean => history.undoStack.length > 0;
export const canRedo = (history: History): boolean => history.redoStack.length > 0;

/** Undoes the latest command; with nothing to undo, returns history and design unchanged. */
export function undo(history: History, design: Design): HistoryStep {
  const entry = history.undoStack[history.undoStack.length - 1];
  if (!entry) return { history, design };
  const applied = applyCommand(design, entry.inverse);
  return {
    history: { ...history, undoStack: history.undoStack.slice(0, -1), redoStack: [...history.redoStack, entry] },
    design: applied.design,
  };
}

/** Redoes the latest undone command by applying it again; with nothing to redo, returns both unchanged. */
export function redo(history: History, design: Design): HistoryStep {
  const entry = history.redoStack[history.redoStack.length - 1];
  if (!entry) return { history, design };
  const applied = applyCommand(design, entry.cmd);
  return {
    history: { ...history, undoStack: [...history.undoStack, { cmd: entry.cmd, inverse: applied.inverse }], redoStack: history.redoStack.slice(0, -1) },
    design: applied.design,
  };
}
