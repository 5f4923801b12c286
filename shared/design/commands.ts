import type { Point, Polyline } from '../geometry/point.ts';
import { assertNever } from '../assertNever.ts';
import type { Design, ThreadSettings, Units } from './design.schema.ts';
import { convertDesignUnits, deleteAt, insertAt, joinPolylines, replaceAt, splitPolyline, withOptional } from './commandOps.ts';

/**
 * Which list of the design a line command addresses. Lines are addressed by their index in
 * `design.lines` / `design.seams`: the stored design stays plain polylines, and every command's inverse
 * restores the exact same order, so indices held by the editor stay valid across undo and redo.
 */
export type LineTarget = 'lines' | 'seams';

/** One indexed line, used by insert and replace (indices are the final positions, ascending). */
export interface IndexedLine {
  readonly index: number;
  readonly line: Polyline;
}

/** Every edit of a design the editor can make; each has an exact inverse (see `applyCommand`). */
export type DesignCommand =
  /** Appends lines at the end (one drawn line, or every line of a motif at once). */
  | { readonly kind: 'addLines'; readonly target: LineTarget; readonly lines: readonly Polyline[] }
  /** Inserts lines so that each ends up at its `index` (entries ascending by index). */
  | { readonly kind: 'insertLines'; readonly target: LineTarget; readonly entries: readonly IndexedLine[] }
  /** Deletes the lines at these indices (distinct, any order). */
  | { readonly kind: 'deleteLines'; readonly target: LineTarget; readonly indices: readonly number[] }
  /** Translates the lines at these indices by (dx, dy) design units. */
  | { readonly kind: 'moveLines'; readonly target: LineTarget; readonly indices: readonly number[]; readonly dx: number; readonly dy: number }
  /** Replaces the lines at these indices (point edits). */
  | { readonly kind: 'replaceLines'; readonly target: LineTarget; readonly entries: readonly IndexedLine[] }
  /** Splits line `index` at `point` on its segment `segment`: the first part stays at `index`, the second follows it. */
  | { readonly kind: 'splitLine'; readonly target: LineTarget; readonly index: number; readonly segment: number; readonly point: Point }
  /** Joins the end of `first` to the start of `second` (each optionally reversed first); the result takes the lower index. */
  | { readonly kind: 'joinLines'; readonly target: LineTarget; readonly first: number; readonly second: number; readonly reverseFirst: boolean; readonly reverseSecond: boolean }
  /** Sets (point) or clears (null) the route's start point. */
  | { readonly kind: 'setStart'; readonly point: Point | null }
  /** Sets (point) or clears (null) the route's end point. */
  | { readonly kind: 'setEnd'; readonly point: Point | null }
  /** Changes the block size; lines stay where they are. */
  | { readonly kind: 'setSize'; readonly width: number; readonly height: number }
  /** Changes units, converting every length of the design (1 in = 2.54 cm). */
  | { readonly kind: 'convertUnits'; readonly units: Units }
  /** Replaces the whole design (used as the exact inverse of unit conversion, and to load a merged copy). */
  | { readonly kind: 'replaceDesign'; readonly design: Design }
  | { readonly kind: 'setEdgeTravel'; readonly value: boolean }
  /** Sets the binding band width in design units, or null for the default. */
  | { readonly kind: 'setBindingBand'; readonly value: number | null }
  | { readonly kind: 'setThread'; readonly thread: ThreadSettings | null }
  /** Sets the quilter's own stitching order, or null to drop it. */
  | { readonly kind: 'setRoute'; readonly route: readonly Polyline[] | null }
  /** Several commands as one undo step, applied in order. */
  | { readonly kind: 'batch'; readonly commands: readonly DesignCommand[] };

/** A command's result: the new design and the command that turns it back into the old one exactly. */
export interface AppliedCommand {
  readonly design: Design;
  readonly inverse: DesignCommand;
}

/**
 * Applies a command to a design, purely. Guarantee: `applyCommand(result.design, result.inverse).design`
 * deep-equals `design` (no floating-point drift: moves and conversions are undone by restoring the old
 * coordinates, never by computing them back). Bad indices or a split that would leave a part shorter
 * than two distinct points are caller bugs and throw "design/commands: …".
 */
export function applyCommand(design: Design, cmd: DesignCommand): AppliedCommand {
  switch (cmd.kind) {
    case 'addLines': {
      const start = design[cmd.target].length;
      const next = { ...design, [cmd.target]: [...design[cmd.target], ...cmd.lines] };
      return { design: next, inverse: { kind: 'deleteLines', target: cmd.target, indices: cmd.lines.map((_, i) => start + i) } };
    }
    case 'insertLines':
      return {
        design: { ...design, [cmd.target]: insertAt(design[cmd.target], cmd.entries) },
        inverse: { kind: 'deleteLines', target: cmd.target, indices: cmd.entries.map((e) => e.index) },
      };
    case 'deleteLines': {
      const { rest, removed } = deleteAt(design[cmd.target], cmd.indices);
      return { design: { ...design, [cmd.target]: rest }, inverse: { kind: 'insertLines', target: cmd.target, entries: removed } };
    }
    case 'moveLines': {
      const entries = cmd.indices.map((index) => ({ index, line: lineAt(design, cmd.target, index).map(([x, y]) => [x + cmd.dx, y + cmd.dy] as const) }));
      return applyCommand(design, { kind: 'replaceLines', target: cmd.target, entries });
    }
    case 'replaceLines': {
      const { next, old } = replaceAt(design[cmd.target], cmd.entries);
      return { design: { ...design, [cmd.target]: next }, inverse: { kind: 'replaceLines', target: cmd.target, entries: old } };
    }
    case 'splitLine': {
      const original = lineAt(design, cmd.target, cmd.index);
      const [first, second] = splitPolyline(original, cmd.segment, cmd.point);
      const lines = insertAt(replaceAt(design[cmd.target], [{ index: cmd.index, line: first }]).next, [{ index: cmd.index + 1, line: second }]);
      const inverse: DesignCommand = {
        kind: 'batch',
        commands: [
          { kind: 'deleteLines', target: cmd.target, indices: [cmd.index + 1] },
          { kind: 'replaceLines', target: cmd.target, entries: [{ index: cmd.index, line: original }] },
        ],
      };
      return { design: { ...design, [cmd.target]: lines }, inverse };
    }
    case 'joinLines': {
      const a = lineAt(design, cmd.target, cmd.first);
      const b = lineAt(design, cmd.target, cmd.second);
      if (cmd.first === cmd.second) throw new Error('design/commands: cannot join a line to itself');
      const [lo, hi] = cmd.first < cmd.second ? [cmd.first, cmd.second] : [cmd.second, cmd.first];
      const joined = joinPolylines(cmd.reverseFirst ? [...a].reverse() : a, cmd.reverseSecond ? [...b].reverse() : b);
      const lines = deleteAt(replaceAt(design[cmd.target], [{ index: lo, line: joined }]).next, [hi]).rest;
      const inverse: DesignCommand = {
        kind: 'batch',
        commands: [
          { kind: 'replaceLines', target: cmd.target, entries: [{ index: lo, line: lineAt(design, cmd.target, lo) }] },
          { kind: 'insertLines', target: cmd.target, entries: [{ index: hi, line: lineAt(design, cmd.target, hi) }] },
        ],
      };
      return { design: { ...design, [cmd.target]: lines }, inverse };
    }
    case 'setStart':
      return { design: withOptional(design, 'start', cmd.point), inverse: { kind: 'setStart', point: design.start ?? null } };
    case 'setEnd':
      return { design: withOptional(design, 'end', cmd.point), inverse: { kind: 'setEnd', point: design.end ?? null } };
    case 'setSize':
      if (!(cmd.width > 0 && cmd.height > 0)) throw new Error('design/commands: block size must be positive');
      return { design: { ...design, width: cmd.width, height: cmd.height }, inverse: { kind: 'setSize', width: design.width, height: design.height } };
    case 'convertUnits':
      return { design: convertDesignUnits(design, cmd.units), inverse: { kind: 'replaceDesign', design } };
    case 'replaceDesign':
      return { design: cmd.design, inverse: { kind: 'replaceDesign', design } };
    case 'setEdgeTravel':
      return { design: { ...design, edgeTravel: cmd.value }, inverse: { kind: 'setEdgeTravel', value: design.edgeTravel } };
    case 'setBindingBand':
      return { design: withOptional(design, 'bindingBand', cmd.value), inverse: { kind: 'setBindingBand', value: design.bindingBand ?? null } };
    case 'setThread':
      return { design: withOptional(design, 'thread', cmd.thread), inverse: { kind: 'setThread', thread: design.thread ?? null } };
    case 'setRoute':
      return { design: withOptional(design, 'route', cmd.route), inverse: { kind: 'setRoute', route: design.route ?? null } };
    case 'batch': {
      let current = design;
      const inverses: DesignCommand[] = [];
      for (const sub of cmd.commands) {
        const applied = applyCommand(current, sub);
        current = applied.design;
        inverses.unshift(applied.inverse);
      }
      return { design: current, inverse: { kind: 'batch', commands: inverses } };
    }
    default:
      return assertNever(cmd);
  }
}

function lineAt(design: Design, target: LineTarget, index: number): Polyline {
  const line = design[target][index];
  if (!line) throw new Error(`design/commands: no ${target} at index ${index}`);
  return line;
}
