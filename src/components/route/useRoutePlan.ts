import { useCallback, useEffect, useState } from 'react';
import type { Design } from '@shared/design/design.schema.ts';
import { apiRequest } from '../designs/apiClient.ts';
import { savedRouteAnswerSchema, type SavedRoute } from '@shared/contract/designs.ts';
import { planAnswerSchema, type PlanResult } from '@shared/contract/plan.ts';

export interface RoutePlanState {
  readonly plan: PlanResult | null;
  readonly saved: SavedRoute | null;
  /** The kept route matches the lines on screen (kept for this version, nothing edited since). */
  readonly savedIsCurrent: boolean;
  readonly busy: 'planning' | 'keeping' | null;
  readonly message: string | null;
  /** Runs the planner on the design as it is on screen. */
  planRoute(): void;
  /** Keeps the planned route, or the quilter's own, for the saved design version. */
  keep(kind: 'planned' | 'own'): void;
}

/** The planner's route for the design on screen, and the route kept with the saved design. */
export function useRoutePlan(designId: string, design: Design | null, savedVersion: number): RoutePlanState {
  const [plan, setPlan] = useState<PlanResult | null>(null);
  const [saved, setSaved] = useState<SavedRoute | null>(null);
  const [busy, setBusy] = useState<RoutePlanState['busy']>(null);
  const [message, setMessage] = useState<string | null>(null);
  const [keptFor, setKeptFor] = useState<Design | null>(null);

  useEffect(() => {
    void (async () => {
      const res = await apiRequest('GET', `/api/designs/${designId}/route`);
      if (!res.ok) return;
      const parsed = savedRouteAnswerSchema.safeParse(res.value);
      if (parsed.success) setSaved(parsed.data.route);
    })();
  }, [designId]);

  // The kept route was made for the design as loaded (or as it was when kept); any later edit makes it stale.
  useEffect(() => {
    if (design && keptFor === null) setKeptFor(design);
  }, [design, keptFor]);

  // A planned route belongs to the design it was planned for: any edit makes it stale.
  useEffect(() => setPlan(null), [design]);

  const planRoute = useCallback(async () => {
    if (!design) return;
    setBusy('planning');
    setMessage(null);
    const res = await apiRequest('POST', `/api/designs/${designId}/plan`, { design });
    setBusy(null);
    if (!res.ok) return setMessage(res.error.message);
    const parsed = planAnswerSchema.safeParse(res.value);
    if (!parsed.success) return setMessage('The planned route came back in a shape this page does not read.');
    setPlan(parsed.data.plan);
  }, [designId, design]);

  const keep = useCallback(async (kind: 'planned' | 'own') => {
    if (!design) return;
    setBusy('keeping');
    setMessage(null);
    const body = kind === 'planned' ? { kind, designVersion: savedVersion } : { kind, designVersion: savedVersion, route: design.route ?? [] };
    const res = await apiRequest('PUT', `/api/designs/${designId}/route`, body);
    setBusy(null);
    if (!res.ok) return setMessage(res.error.message);
    const parsed = savedRouteAnswerSchema.safeParse(res.value);
    if (parsed.success) setSaved(parsed.data.route);
    setKeptFor(design);
    setMessage(kind === 'planned' ? 'Kept the planned route.' : 'Kept your stitching order.');
  }, [designId, design, savedVersion]);

  const savedIsCurrent = saved !== null && saved.current && saved.designVersion <= savedVersion && design === keptFor;
  return { plan, saved, savedIsCurrent, busy, message, planRoute: () => void planRoute(), keep: (k) => void keep(k) };
}
