import { clipPolylineToBlock, isLineInsideBlock } from '../design/blockBounds.ts';
import { applyCommand, type DesignCommand } from '../design/commands.ts';
import type { Design } from '../design/design.schema.ts';

/** A command after the block check: what to apply (null: nothing) and what to tell the quilter (null: nothing). */
export interface GuardedEdit {
  readonly command: DesignCommand | null;
  readonly notice: string | null;
}

function countOutside(design: Design): number {
  return design.lines.filter((l) => !isLineInsideBlock(l, design)).length;
}

/**
 * Keeps quilting lines inside the block, as the server does (designInputSchema): a quilting line being added is
 * clipped to the block (the part outside is left off; a line wholly outside is not added), and any other edit that
 * would take a quilting line outside (a move, a smaller block) is refused. Each says why in one sentence. Replacing
 * the whole design (a reload, a saved version) is left alone, so an older drawing still opens.
 */
export function guardBlockEdit(design: Design, command: DesignCommand): GuardedEdit {
  if (command.kind === 'replaceDesign') return { command, notice: null };
  if (command.kind === 'addLines' && command.target === 'lines') {
    const lines = command.lines.flatMap((l) => clipPolylineToBlock(l, design));
    if (lines.length === 0) return { command: null, notice: 'That line lies outside the block, so it was not added: quilting lines stay inside the block.' };
    const clipped = lines.length !== command.lines.length || command.lines.some((l) => !isLineInsideBlock(l, design));
    return { command: { ...command, lines }, notice: clipped ? 'The part outside the block was left off: quilting lines stay inside the block.' : null };
  }
  const after = applyCommand(design, command).design;
  if (countOutside(after) > countOutside(design)) {
    return { command: null, notice: 'Not done: it would put a quilting line outside the block, and quilting lines stay inside it.' };
  }
  return { command, notice: null };
}
