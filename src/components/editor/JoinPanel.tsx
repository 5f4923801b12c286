import { memo, useDeferredValue, useMemo } from 'react';
import type { Design } from '@shared/design/design.schema.ts';
import type { DesignCommand } from '@shared/design/commands.ts';
import { commandForJoin } from '@shared/joins/joinCommand.ts';
import { findJoins, type JoinEnd, type JoinProposal } from '@shared/joins/findJoins.ts';
import { formatLength, type UnitPair } from '@shared/units/units.ts';

/** Past this many quilting lines the suggestions are not worked out while drawing (they run on every edit). */
const MAX_LINES_FOR_JOINS = 3000;
const SHOWN_JOINS = 5;

export interface JoinPanelProps {
  readonly design: Design;
  readonly units: UnitPair;
  readonly onAdd: (command: DesignCommand) => void;
  /** The join to draw on the canvas (null: none). */
  readonly onShow: (join: JoinProposal | null) => void;
  readonly shown: JoinProposal | null;
}

const END_WORDS: Readonly<Record<JoinEnd, string>> = { line: 'a quilting line', seam: 'a seam', edge: 'the edge' };

/**
 * Shortest joins between line groups that would save a stop, shortest first: each as a new line inside a patch
 * (it will show on the quilt) or a run along the edge inside the binding band (hidden). Adding one is one
 * undoable command. Nothing shows when the lines already sew as one group.
 */
export const JoinPanel = memo(function JoinPanel({ design, units, onAdd, onShow, shown }: JoinPanelProps) {
  const deferred = useDeferredValue(design);
  const found = useMemo(() => (deferred.lines.length > 0 && deferred.lines.length <= MAX_LINES_FOR_JOINS ? findJoins(deferred) : null), [deferred]);
  if (!found || !found.ok || found.value.groups.length < 2) return null;
  const joins = found.value.joins.filter((j) => j.stopsSaved > 0).slice(0, SHOWN_JOINS);
  const stale = deferred !== design;
  return (
    <section aria-label="Join line groups" className={`rounded border border-muslin-300 bg-white p-3 text-sm ${stale ? 'opacity-70' : ''}`}>
      <h2 className="text-lg font-semibold">Join line groups</h2>
      <p className="mt-1">
        Your lines form {found.value.groups.length} groups the needle cannot reach without a stop. A short join saves the stop:
      </p>
      {joins.length === 0 && <p className="mt-1">No join inside the block would save a stop here.</p>}
      <ol className="mt-2 flex flex-col gap-2">
        {joins.map((j) => {
          const key = `${j.groups[0]}-${j.groups[1]}`;
          const isShown = shown !== null && shown.groups[0] === j.groups[0] && shown.groups[1] === j.groups[1];
          return (
            <li key={key} className={`rounded border p-2 ${isShown ? 'border-denim-600 bg-muslin-100' : 'border-muslin-200'}`} data-join={key}>
              <p>
                <strong>Groups {j.groups[0] + 1} and {j.groups[1] + 1}</strong>: {formatLength(j.length, units.design, units.viewer)}{' '}
                {j.visible ? 'of new quilting line, which will show' : 'along the edge, inside the binding band (hidden)'}
                {' '}from {END_WORDS[j.legs[0]!.fromEnd]} to {END_WORDS[j.legs[j.legs.length - 1]!.toEnd]}.{' '}
                <span data-figure="join-saves">Saves {j.stopsSaved} stop{j.stopsSaved === 1 ? '' : 's'}.</span>
              </p>
              <div className="mt-1 flex gap-2">
                <button type="button" className="rounded border border-denim-600 px-2 py-1" aria-pressed={isShown} onClick={() => onShow(isShown ? null : j)}>
                  {isShown ? 'Hide' : 'Show'}
                </button>
                <button type="button" className="rounded bg-denim-600 px-2 py-1 font-semibold text-white" onClick={() => { onShow(null); onAdd(commandForJoin(j)); }}>
                  Add join
                </button>
              </div>
            </li>
          );
        })}
      </ol>
    </section>
  );
});
