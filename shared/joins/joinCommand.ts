import type { DesignCommand } from '../design/commands.ts';
import { joinLines, type JoinProposal } from './findJoins.ts';

/**
 * The design command that adds a chosen join: its new lines appended to the quilting lines in one
 * `addLines`, so the editor's history undoes and redoes it as one step (its inverse deletes exactly those lines).
 */
export function commandForJoin(join: JoinProposal): DesignCommand {
  return { kind: 'addLines', target: 'lines', lines: joinLines(join) };
}
