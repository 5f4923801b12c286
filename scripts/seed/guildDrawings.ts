// The demo guild's drawings (invented content), built with the real layout and motif generators and checked by
// designSchema. Pure: no database here (guildDesigns.ts and guildClass.ts store them).
import { designSchema, type Design } from '@shared/design/design.schema.ts';
import { buildPiecedLayout, type PiecedLayoutId } from '@shared/layouts/piecedLayouts.ts';
import { generateMotif, type MotifParamsInput } from '@shared/motifs/motifs.ts';
import type { Polyline } from '@shared/geometry/point.ts';

export interface GuildDrawing {
  title: string;
  notes: string;
  design: Design;
}

interface Recipe {
  layout: PiecedLayoutId;
  units: 'in' | 'cm';
  size: number;
  /** Quilt every seam in the ditch (the seam line itself becomes a quilting line). */
  ditch: boolean;
  /** Motifs by patch index in the layout's patch list. */
  motifs: { patch: number; params: MotifParamsInput }[];
}

export function buildDrawing(r: Recipe): Design {
  const layout = buildPiecedLayout(r.layout, r.size, r.size);
  const lines: Polyline[] = r.ditch ? layout.seams.map((s) => [...s]) : [];
  for (const m of r.motifs) {
    const patch = layout.patches[m.patch];
    if (!patch) throw new Error(`scripts/seed/guildDrawings: layout ${r.layout} has no patch ${m.patch}`);
    const generated = generateMotif(patch.polygon, m.params);
    if (!generated.ok) throw new Error(`scripts/seed/guildDrawings: motif ${JSON.stringify(m.params)} failed: ${generated.error.kind}`);
    lines.push(...generated.value.lines);
  }
  return designSchema.parse({ version: 1, units: r.units, width: r.size, height: r.size, seams: layout.seams, lines });
}

/** Index of the nine-patch's centre square (the patch whose centroid is the block's centre). */
function centrePatch(layout: PiecedLayoutId, size: number): number {
  const { patches } = buildPiecedLayout(layout, size, size);
  const i = patches.findIndex((p) => {
    const xs = p.polygon.map((q) => q[0]);
    const ys = p.polygon.map((q) => q[1]);
    return Math.min(...xs) < size / 2 && Math.max(...xs) > size / 2 && Math.min(...ys) < size / 2 && Math.max(...ys) > size / 2;
  });
  if (i < 0) throw new Error(`scripts/seed/guildDrawings: no centre patch in ${layout}`);
  return i;
}

export function tobiasDrawings(): GuildDrawing[] {
  return [
    {
      title: 'Heron Bend nine-patch',
      notes: 'Walking foot: every seam in the ditch, straight lines 3/4 in apart in the centre square.',
      design: buildDrawing({ layout: 'nine-patch', units: 'in', size: 12, ditch: true, motifs: [{ patch: centrePatch('nine-patch', 12), params: { kind: 'straight-lines', spacing: 0.75, angle: 45 } }] }),
    },
    {
      title: 'Riverbank half-square triangle',
      notes: 'Ribbon candy in both triangles, loops 1 1/2 in long.',
      design: buildDrawing({ layout: 'half-square-triangle', units: 'in', size: 10, ditch: false, motifs: [0, 1].map((patch) => ({ patch, params: { kind: 'ribbon-candy', pitch: 1.5, margin: 0.25 } })) }),
    },
    {
      title: 'Ferry landing four-patch',
      notes: 'Ditch quilted, echo lines in every square.',
      design: buildDrawing({ layout: 'four-patch', units: 'in', size: 8, ditch: true, motifs: [0, 1, 2, 3].map((patch) => ({ patch, params: { kind: 'echo', spacing: 0.5 } })) }),
    },
  ];
}

export function saoirseDrawings(): GuildDrawing[] {
  return [
    {
      title: 'Millpond pebbles',
      notes: 'Free-motion pebbles in a 30 cm square-in-a-square, ditch around the centre.',
      design: buildDrawing({ layout: 'square-in-a-square', units: 'cm', size: 30, ditch: true, motifs: [{ patch: centrePatch('square-in-a-square', 30), params: { kind: 'pebbles', minRadius: 1, maxRadius: 2.5 } }] }),
    },
  ];
}

/** The pinwheel's blades (patches 0, 2, 4, 6 of the layout: the top, right, bottom and left blade). */
const PINWHEEL_BLADES = [0, 2, 4, 6];

/** Marigold's two lesson blocks: week 1 in the ditch, week 2 the same block with echoes in the blades. */
export function marigoldDrawings(): { ditch: GuildDrawing; echoes: GuildDrawing } {
  return {
    ditch: {
      title: 'Quilt-along week 1: pinwheel in the ditch',
      notes: 'Lesson block for the Tuesday quilt-along: every seam in the ditch.',
      design: buildDrawing({ layout: 'pinwheel', units: 'in', size: 12, ditch: true, motifs: [] }),
    },
    echoes: {
      title: 'Quilt-along week 2: pinwheel with echoed blades',
      notes: 'Lesson block for the Tuesday quilt-along: the week 1 ditch lines plus echoes 1/2 in apart inside each blade.',
      design: buildDrawing({ layout: 'pinwheel', units: 'in', size: 12, ditch: true, motifs: PINWHEEL_BLADES.map((patch) => ({ patch, params: { kind: 'echo', spacing: 0.5 } })) }),
    },
  };
}
