import type { StrokeDirection } from '../route/strokeDirection.ts';
import { directionWords } from './stepText.ts';
import type { Step } from './walkthrough.types.ts';

/** A side of the block as drawn. */
export type Edge = 'top' | 'bottom' | 'left' | 'right';

/** The block edge a straight line runs toward (y grows toward the quilter, so "away" is the top edge). */
const EDGE_OF: Record<Exclude<StrokeDirection, 'curved'>, Edge> = { away: 'top', toward: 'bottom', left: 'left', right: 'right' };

/** Words that only hold while the block is not turned. */
const SEAT_WORDS = /\baway from you\b|\btoward you\b|\bto your (left|right)\b/;

/**
 * Where a step's own words disagree with each other or with its geometry, as plain sentences (empty when they
 * agree). Checked: a stitch step's direction words match its line (`step.direction`, from the points) and the card's
 * direction chip; no instruction uses words tied to the quilter's seat (a turn tip would make them false); a tip to
 * turn the block names the edge the line runs toward and the turn it takes (top: half, left or right: quarter), and
 * appears only on straight lines not already running toward the quilter; curves get no turn tip. `turnedFor` is the
 * edge the block is already turned for by the stitch step before (buildWalkthrough does not repeat that tip).
 */
export function findStepContradictions(step: Step, turnedFor: Edge | null = null): string[] {
  const problems: string[] = [];
  if (SEAT_WORDS.test(step.instruction)) problems.push(`the instruction speaks from the quilter's seat: "${step.instruction}"`);
  const turn = step.hints.find((h) => h.kind === 'turn-block');
  if (step.kind !== 'stitch') {
    if (turn) problems.push('a turn tip on a step that sews nothing new');
    return problems;
  }
  const direction = step.direction;
  if (direction === null) return [...problems, 'a stitch step without a direction'];
  const claimed = /toward the (top|bottom|left|right) edge/.exec(step.instruction)?.[1] as Edge | undefined;
  if (direction === 'curved') {
    if (claimed) problems.push(`a curve said to run toward the ${claimed} edge`);
    if (turn) problems.push('a turn tip on a curve');
    return problems;
  }
  const straight = !/pivoting at/.test(step.instruction);
  const edge = EDGE_OF[direction];
  if (straight) {
    if (claimed !== edge) problems.push(`the line runs toward the ${edge} edge but the text says ${claimed ?? 'nothing'}`);
    if (!step.instruction.includes(directionWords(direction))) problems.push('the direction chip and the instruction differ');
  }
  if (!turn) {
    if (straight && edge !== 'bottom' && turnedFor !== edge) problems.push(`a line toward the ${edge} edge without a tip to turn the block`);
    return problems;
  }
  if (!straight) return [...problems, 'a turn tip on lines that pivot'];
  if (edge === 'bottom') problems.push('a tip to turn a line that already runs toward the quilter');
  const tipEdge = /so its (top|bottom|left|right) edge is nearest you/.exec(turn.text)?.[1];
  if (tipEdge !== edge) problems.push(`the tip turns the ${tipEdge ?? 'unnamed'} edge toward the quilter, the line runs toward the ${edge} edge`);
  const wanted = edge === 'top' ? 'half turn' : 'quarter turn';
  if (!turn.text.includes(wanted)) problems.push(`the tip should ask for a ${wanted}`);
  if (!/this line runs toward you/.test(turn.text)) problems.push('the tip does not say where the line runs after the turn');
  return problems;
}

/** Every contradiction in a walkthrough's steps, prefixed with the step number; the turn state runs across steps. */
export function findWalkthroughContradictions(steps: readonly Step[]): string[] {
  let turnedFor: Edge | null = null;
  const out: string[] = [];
  for (const step of steps) {
    out.push(...findStepContradictions(step, turnedFor).map((p) => `step ${step.index + 1}: ${p}`));
    if (step.kind !== 'stitch') continue;
    const straight = step.direction !== null && step.direction !== 'curved' && !/pivoting at/.test(step.instruction);
    // As buildWalkthrough keeps it: the block stays turned for the edge of the last straight stitch step.
    turnedFor = straight ? EDGE_OF[step.direction as Exclude<StrokeDirection, 'curved'>] : null;
    if (turnedFor === 'bottom') turnedFor = null;
  }
  return out;
}
