// The chained route across a quilt in quilting words, for the quilt page and the printed plan alike: one sentence
// per block (where to start and end it, and the travel from the block before) and one for the whole route.
import type { Units } from '../design/design.schema.ts';
import type { QuiltPlan } from '../contract/quiltPlan.ts';
import { formatLength } from '../units/units.ts';

/** Corner indices as cornerMap.ts numbers them: 0 top left, then clockwise. */
export const CORNER_WORDS = ['top left', 'top right', 'bottom right', 'bottom left'] as const;

/** "Row 1, column 2: start at the top left corner, end at the bottom right (travel 1 in from the last block)." */
export function chainStepWords(plan: QuiltPlan, index: number, viewerUnits: Units): string {
  const s = plan.steps[index]!;
  const link = s.linkBefore > 0 ? ` (travel ${formatLength(s.linkBefore, plan.units, viewerUnits)} from the last block)` : '';
  return `Row ${s.cell.row + 1}, column ${s.cell.column + 1}: start at the ${CORNER_WORDS[s.entry]} corner, end at the ${CORNER_WORDS[s.exit]}${link}.`;
}

/** "1 pass, 0 stops; travel 9 in (7 in inside blocks, 2 in between them), the least possible." */
export function chainSummaryWords(plan: QuiltPlan, viewerUnits: Units): string {
  const len = (v: number) => formatLength(v, plan.units, viewerUnits);
  return (
    `${plan.passes} ${plan.passes === 1 ? 'pass' : 'passes'}, ${plan.stops} ${plan.stops === 1 ? 'stop' : 'stops'}; ` +
    `travel ${len(plan.totalTravel)} (${len(plan.blockTravel)} inside blocks, ${len(plan.linkTravel)} between them), ` +
    (plan.proven ? 'the least possible.' : `at least ${len(plan.lowerBound)} is needed (not proven least in time).`)
  );
}
