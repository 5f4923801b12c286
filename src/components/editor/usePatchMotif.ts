import { useCallback, useMemo, useState } from 'react';
import type { Design } from '@shared/design/design.schema.ts';
import type { Point, Polyline } from '@shared/geometry/point.ts';
import { generateMotif, type MotifKind } from '@shared/motifs/motifs.ts';
import { buildBlockPlaces, findPatchAt } from '@shared/walkthrough/locate.ts';
import { findPatchFaces } from '@shared/walkthrough/patchFaces.ts';
import { namePatches, type NamedPatch } from '@shared/walkthrough/patchNames.ts';
import { buildMotifParams, defaultMotifValues } from './motifForm.ts';

/** The motif preview for the picked patch: its lines, or why the motif does not fit. */
export type MotifPreview = { readonly ok: true; readonly lines: readonly Polyline[] } | { readonly ok: false; readonly message: string };

export interface PatchMotif {
  readonly patch: NamedPatch | null;
  readonly kind: MotifKind;
  readonly values: Readonly<Record<string, number>>;
  readonly motif: MotifPreview | null;
  /** Motif tool: picks the patch under a canvas point (none when the point is outside every patch). */
  pickPatchAt(p: Point): void;
  setKind(kind: MotifKind): void;
  setValue(key: string, value: number): void;
}

/** The motif tool's state: the patches of the block, the picked one, the chosen motif and its live preview. */
export function usePatchMotif(design: Design): PatchMotif {
  // Patches come from the seams and the block size only: drawing quilting lines leaves them alone.
  // eslint-disable-next-line react-hooks/exhaustive-deps -- keyed on seams and size on purpose (see above).
  const patches = useMemo(() => namePatches(findPatchFaces(design), design), [design.seams, design.width, design.height]);
  // eslint-disable-next-line react-hooks/exhaustive-deps -- places read the size, units and seams, which change only with the patches.
  const places = useMemo(() => buildBlockPlaces(design, patches), [patches]);
  const [patchIndex, setPatchIndex] = useState<number | null>(null);
  const [kind, setKindState] = useState<MotifKind>('straight-lines');
  const [values, setValues] = useState<Record<string, number>>(() => defaultMotifValues('straight-lines', design.units));
  const patch = patchIndex !== null ? patches[patchIndex] ?? null : null;
  const motif = useMemo((): MotifPreview | null => {
    if (!patch) return null;
    const r = generateMotif(patch.polygon, buildMotifParams(kind, values));
    if (r.ok) return { ok: true, lines: r.value.lines };
    return { ok: false, message: r.error.kind === 'invalid-params' ? r.error.issues.map((i) => i.message).join(' ') : 'This motif does not fit this patch shape.' };
  }, [patch, kind, values]);

  const pickPatchAt = useCallback((p: Point) => {
    const i = findPatchAt(places, p);
    setPatchIndex(i >= 0 ? i : null);
  }, [places]);
  const setKind = useCallback((k: MotifKind) => {
    setKindState(k);
    setValues(defaultMotifValues(k, design.units));
  }, [design.units]);
  const setValue = useCallback((key: string, v: number) => setValues((m) => ({ ...m, [key]: v })), []);
  return { patch, kind, values, motif, pickPatchAt, setKind, setValue };
}
