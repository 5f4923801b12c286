/**
 * Seeded whole blocks as a quilter would draw them for a sampler quilt: a pieced layout whose seams are stitched in
 * the ditch, every patch filled with one motif (alternating between two motifs patch by patch), each motif at
 * spacings around the motif panel's starting values. 12 in blocks, inches. Same seed → same blocks, so benchmark
 * runs compare (mulberry32, as flatbush's bench does). Used by the whole-quilt planning benchmark and its browser test.
 */
import { designSchema, type Design } from '../design/design.schema.ts';
import { buildPiecedLayout, PIECED_LAYOUTS } from '../layouts/piecedLayouts.ts';
import { fillDesign } from '../motifs/fillDesign.ts';
import { patchesInReadingOrder } from '../motifs/fillDesign.ts';
import { motifParamsSchema, type MotifParams } from '../motifs/motifs.ts';
import { seededRandom } from '../seededRandom.ts';

/** Motifs at spacings a quilter uses in a 12 in block (the panel's starting values, scaled by `k` ∈ [1, 1.5]). */
function motifFor(index: number, k: number, seed: number): MotifParams {
  const choices = [
    { kind: 'straight-lines', spacing: 0.5 * k, angle: 45 },
    { kind: 'crosshatch', spacing: 1 * k, angle: 45, crossAngle: 90 },
    { kind: 'echo', spacing: 0.5 * k, maxCount: 20 },
    { kind: 'ribbon-candy', pitch: 0.75 * k, margin: 0.125 },
    { kind: 'arches', archWidth: 1.5 * k, rowSpacing: 1 * k, angle: 0 },
    { kind: 'pebbles', minRadius: 0.3 * k, maxRadius: 0.6 * k, gap: 0.05, seed },
  ];
  return motifParamsSchema.parse(choices[index % choices.length]);
}

/** `count` distinct blocks: layout, the two motifs and their spacing all vary with the block's number and seed. */
export function filledBlockDesigns(count: number, seed = 1): { readonly title: string; readonly design: Design }[] {
  const rnd = seededRandom(seed);
  const layouts = PIECED_LAYOUTS.filter((l) => l.id !== 'blank');
  const out: { title: string; design: Design }[] = [];
  for (let i = 0; out.length < count; i++) {
    if (i > count * 4) throw new Error('testing/filledBlocks: could not make enough blocks');
    const layout = layouts[i % layouts.length]!;
    const k = 1 + Math.round(rnd() * 4) / 8;
    const first = motifFor(i, k, i + 1);
    const second = motifFor(i + 2 + Math.floor(rnd() * 3), k, i + 7);
    const { seams } = buildPiecedLayout(layout.id, 12, 12);
    const pieced = designSchema.parse({ version: 1, units: 'in', width: 12, height: 12, seams, lines: [], edgeTravel: true });
    const patches = patchesInReadingOrder(pieced).length;
    const fills = Array.from({ length: patches }, (_, p) => ({ patch: p, motif: p % 2 === 0 ? first : second }));
    const filled = fillDesign(pieced, { fills });
    if (!filled.ok) continue;
    out.push({ title: `${layout.label}, ${first.kind} and ${second.kind} #${i + 1}`, design: filled.value });
  }
  return out;
}
