import type { EndsStep } from '@shared/editor/endsTool.ts';
import { assertNever } from '@shared/assertNever.ts';
import type { ToolId } from './Toolbar.tsx';

/** Where the tool in use is in its gesture: nothing begun, a line under way, or the start-and-end tool's step. */
export type ToolProgress =
  | { readonly kind: 'idle' }
  | { readonly kind: 'drawing' }
  | { readonly kind: 'ends'; readonly next: EndsStep };

/**
 * The one-line hint under the canvas for the tool in use: how to begin, how to finish and how to cancel, in our
 * own words. It changes as the gesture goes on (the start-and-end tool names its step).
 */
export function toolHint(tool: ToolId, progress: ToolProgress): string {
  const drawing = progress.kind === 'drawing';
  switch (tool) {
    case 'select':
      return 'Click a line to pick it (Shift+click adds more), drag a picked line to move it · Esc lets go.';
    case 'ruler':
    case 'seam': {
      const what = tool === 'ruler' ? 'quilting line' : 'seam line';
      return drawing
        ? `Release or click where the ${what} ends · Esc drops it.`
        : `Straight ${what}: press where it starts and drag to where it ends, or click the start, then the end.`;
    }
    case 'polyline':
      return drawing
        ? 'Click the next corner · double-click or Enter to finish · Backspace takes back a corner · Esc drops the line.'
        : 'Corner line: click where the line starts, then each corner where it turns.';
    case 'curve':
      return drawing
        ? 'Click the next point the curve bends through · double-click or Enter to finish · Esc drops the curve.'
        : 'Smooth curve: click the points the curve should pass through, starting at one end.';
    case 'freehand':
      return drawing ? 'Release to finish the line.' : 'Freehand: press and draw as with a marking pencil; release to finish.';
    case 'motif':
      return 'Click a patch of the block, choose a motif on the right, then place it.';
    case 'ends':
      return progress.kind === 'ends' && progress.next === 'end'
        ? 'Step 2 of 2: click where the needle finishes · Esc goes back to step 1.'
        : 'Step 1 of 2: click where the needle starts.';
    case 'order':
      return 'Click the quilting lines in the order you will stitch them; each click adds the next line.';
    default:
      return assertNever(tool);
  }
}
