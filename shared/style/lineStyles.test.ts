// Checks of the visual language against outside references:
// - colour-vision simulation: Machado, Oliveira and Fernandes, "A Physiologically-based Model for Simulation of
//   Color Vision Deficiency", IEEE TVCG 2009, severity 1.0 matrices in linear RGB (matrix values from memory);
// - colour difference: CIE 1976 L*a*b* ΔE (sRGB → XYZ with the IEC 61966-2-1 matrix, D65 white); a ΔE of about
//   2.3 is a just-noticeable difference (Sharma, Digital Color Imaging Handbook, 2003 — from memory). We ask 15 for
//   lines a quilter must tell apart at a glance (our own threshold, no source);
// - WCAG 2.2 §1.4.1 Use of Color: every style differs from every other by something other than colour.
import { describe, expect, it } from 'vitest';
import { LINE_GROUP_COLOURS, LINE_STYLES, MARK_STYLES, OKABE_ITO } from './lineStyles.ts';

type Matrix = readonly (readonly [number, number, number])[];
const SIMULATIONS: Record<string, Matrix> = {
  'normal vision': [[1, 0, 0], [0, 1, 0], [0, 0, 1]],
  protanopia: [[0.152286, 1.052583, -0.204868], [0.114503, 0.786281, 0.099216], [-0.003882, -0.048116, 1.051998]],
  deuteranopia: [[0.367322, 0.860646, -0.227968], [0.280085, 0.672501, 0.047413], [-0.01182, 0.04294, 0.968881]],
  tritanopia: [[1.255528, -0.076749, -0.178779], [-0.078411, 0.930809, 0.147602], [0.004733, 0.691367, 0.3039]],
};

function toLinear(hex: string): [number, number, number] {
  const c = [1, 3, 5].map((i) => parseInt(hex.slice(i, i + 2), 16) / 255).map((v) => (v <= 0.04045 ? v / 12.92 : ((v + 0.055) / 1.055) ** 2.4));
  return [c[0]!, c[1]!, c[2]!];
}

function lab([r, g, b]: readonly number[]): [number, number, number] {
  const x = (0.4124 * r! + 0.3576 * g! + 0.1805 * b!) / 0.95047;
  const y = 0.2126 * r! + 0.7152 * g! + 0.0722 * b!;
  const z = (0.0193 * r! + 0.1192 * g! + 0.9505 * b!) / 1.08883;
  const f = (t: number) => (t > 0.008856 ? Math.cbrt(t) : 7.787 * t + 16 / 116);
  return [116 * f(y) - 16, 500 * (f(x) - f(y)), 200 * (f(y) - f(z))];
}

function seenAs(hex: string, m: Matrix): [number, number, number] {
  const v = toLinear(hex);
  const clamp = (n: number) => Math.min(1, Math.max(0, n));
  return lab(m.map((row) => clamp(row[0] * v[0] + row[1] * v[1] + row[2] * v[2])));
}

function deltaE(a: readonly number[], b: readonly number[]): number {
  return Math.hypot(a[0]! - b[0]!, a[1]! - b[1]!, a[2]! - b[2]!);
}

function closestPair(colours: Record<string, string>, m: Matrix): { pair: string; dE: number } {
  let best = { pair: '', dE: Infinity };
  const names = Object.keys(colours);
  for (let i = 0; i < names.length; i++) {
    for (let j = i + 1; j < names.length; j++) {
      const dE = deltaE(seenAs(colours[names[i]!]!, m), seenAs(colours[names[j]!]!, m));
      if (dE < best.dE) best = { pair: `${names[i]} / ${names[j]}`, dE };
    }
  }
  return best;
}

describe('the colour math itself (so the checks below can fail)', () => {
  it('gives the CIE L*a*b* of white and of sRGB red (published values: 100,0,0 and about 53.2, 80.1, 67.2)', () => {
    const white = lab(toLinear('#FFFFFF'));
    expect(white[0]).toBeCloseTo(100, 1);
    expect(Math.abs(white[1]) + Math.abs(white[2])).toBeLessThan(0.5);
    const red = lab(toLinear('#FF0000'));
    expect(red[0]).toBeCloseTo(53.2, 0);
    expect(red[1]).toBeCloseTo(80.1, 0);
    expect(red[2]).toBeCloseTo(67.2, 0);
  });

  it('finds red and green hard to tell apart under deuteranopia, as the deficiency is known for', () => {
    expect(deltaE(seenAs('#D62728', SIMULATIONS['deuteranopia']!), seenAs('#2CA02C', SIMULATIONS['deuteranopia']!))).toBeLessThan(15);
    expect(deltaE(seenAs('#D62728', SIMULATIONS['normal vision']!), seenAs('#2CA02C', SIMULATIONS['normal vision']!))).toBeGreaterThan(50);
  });
});

describe('the route colours stay apart for colour-blind quilters', () => {
  const routeAndMarks = {
    quiltingLine: LINE_STYLES.quiltingLine.colour,
    stitch: LINE_STYLES.stitch.colour,
    retrace: LINE_STYLES.retrace.colour,
    ditch: LINE_STYLES.ditch.colour,
    edge: LINE_STYLES.edge.colour,
    looseEnd: MARK_STYLES.looseEnd.colour,
  };
  for (const [name, matrix] of Object.entries(SIMULATIONS)) {
    it(`every pair differs by ΔE ≥ 15 under ${name}`, () => {
      const closest = closestPair(routeAndMarks, matrix);
      expect(closest.dE, closest.pair).toBeGreaterThanOrEqual(15);
    });
  }

  it('uses only Okabe–Ito colours for the route and the line groups', () => {
    const palette = new Set<string>(Object.values(OKABE_ITO));
    for (const kind of ['stitch', 'retrace', 'ditch', 'edge'] as const) expect(palette.has(LINE_STYLES[kind].colour), kind).toBe(true);
    for (const c of LINE_GROUP_COLOURS) expect(palette.has(c)).toBe(true);
  });
});

describe('nothing depends on colour alone (WCAG 2.2 §1.4.1)', () => {
  it('every line style has its own dash pattern or width', () => {
    const looks = Object.entries(LINE_STYLES).map(([name, s]) => [name, `${s.dash.join(',')}|${s.dash.length === 0 ? s.width : ''}`] as const);
    const travel = looks.filter(([name]) => name === 'retrace' || name === 'ditch' || name === 'edge');
    expect(new Set(travel.map(([, look]) => look)).size).toBe(travel.length);
    // The three solid lines differ by width: seams thinnest, the route thickest.
    expect(LINE_STYLES.seam.width).toBeLessThan(LINE_STYLES.quiltingLine.width);
    expect(LINE_STYLES.quiltingLine.width).toBeLessThan(LINE_STYLES.stitch.width);
  });

  it('every mark has its own shape', () => {
    const shapes = Object.values(MARK_STYLES).map((m) => m.shape);
    expect(new Set(shapes).size).toBe(shapes.length);
  });
});
