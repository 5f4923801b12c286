import type { DesignCommand } from '@shared/design/commands.ts';
import type { Design, Units } from '@shared/design/design.schema.ts';
import type { JoinProposal } from '@shared/joins/findJoins.ts';
import type { UnitPair } from '@shared/units/units.ts';
import { RouteCheckPanel } from '../route/RouteCheckPanel.tsx';
import { RoutePanel } from '../route/RoutePanel.tsx';
import type { RouteCheckState } from '../route/useRouteCheck.ts';
import type { RoutePlanState } from '../route/useRoutePlan.ts';
import type { RoutePlayer } from '../route/useRoutePlayer.ts';
import { BlockSettingsPanel } from './BlockSettingsPanel.tsx';
import { JoinPanel } from './JoinPanel.tsx';
import { MotifPanel } from './MotifPanel.tsx';
import { SavedVersionsPanel } from './SavedVersionsPanel.tsx';
import type { DesignDocument } from './useDesignDocument.ts';
import type { PatchMotif } from './usePatchMotif.ts';

export interface SidePanelsProps {
  readonly designId: string;
  readonly design: Design;
  readonly doc: DesignDocument;
  readonly viewerUnits: Units;
  readonly unitPair: UnitPair;
  readonly dispatch: (cmd: DesignCommand) => void;
  /** The motif tool's state, or null when another tool is in use (the panel is hidden). */
  readonly motif: PatchMotif | null;
  readonly check: RouteCheckState;
  readonly shownJoin: JoinProposal | null;
  readonly onShowJoin: (join: JoinProposal | null) => void;
  readonly routes: RoutePlanState;
  readonly player: RoutePlayer;
  /** Drops the stitching order being clicked and the design's own route (one undo step). */
  readonly onClearOwn: () => void;
}

/** The column beside the canvas: motif (with its tool), route check, joins, block settings, routes, saved versions. */
export function SidePanels({ designId, design, doc, viewerUnits, unitPair, dispatch, motif, check, shownJoin, onShowJoin, routes, player, onClearOwn }: SidePanelsProps) {
  const preview = motif?.motif ?? null;
  const hasOwnRoute = Boolean(design.route && design.route.length > 0);
  return (
    <aside className="flex flex-col gap-3">
      {motif && (
        <MotifPanel
          units={design.units}
          kind={motif.kind}
          values={motif.values}
          patchName={motif.patch?.name ?? null}
          result={preview ? (preview.ok ? { ok: true, lines: preview.lines.length } : preview) : null}
          onKind={motif.setKind}
          onValue={motif.setValue}
          onPlace={() => preview?.ok && dispatch({ kind: 'addLines', target: 'lines', lines: preview.lines })}
        />
      )}
      <RouteCheckPanel check={check.check} state={check.state} message={check.message} units={design.units} viewerUnits={viewerUnits} />
      <JoinPanel design={design} units={unitPair} onAdd={dispatch} onShow={onShowJoin} shown={shownJoin} />
      <BlockSettingsPanel design={design} dispatch={dispatch} generation={doc.generation} />
      <RoutePanel routes={routes} player={player} units={unitPair} canKeep={doc.status.kind === 'saved'} hasOwnRoute={hasOwnRoute} onClearOwn={onClearOwn} />
      <SavedVersionsPanel designId={designId} baseVersion={doc.version} canGoBack={doc.status.kind === 'saved'} onRestored={doc.replaceFromServer} onConflict={doc.openConflict} />
    </aside>
  );
}
