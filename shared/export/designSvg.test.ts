import { execFileSync } from 'node:child_process';
import { describe, expect, it } from 'vitest';
import { designSchema, type Design } from '../design/design.schema.ts';
import { buildDesignSvg, buildDesignThumbnailSvg, type SvgStroke } from './designSvg.ts';

const block = (over: Partial<Design> = {}): Design =>
  designSchema.parse({
    version: 1,
    units: 'in',
    width: 12,
    height: 12,
    seams: [[[6, 0], [6, 12]]],
    lines: [[[0, 3], [12, 3]], [[0, 9], [12, 9]]],
    ...over,
  });

const route: SvgStroke[] = [
  { pass: 1, kind: 'stitch', points: [[0, 3], [12, 3]] },
  { pass: 1, kind: 'edge', points: [[12, 3], [12, 9]] },
  { pass: 1, kind: 'stitch', points: [[12, 9], [0, 9]] },
  { pass: 2, kind: 'retrace', points: [[0, 9], [6, 9]] },
];

/** Parses the SVG with Python's standard-library XML parser (an independent, strict XML reader) and
 * returns [tag, attributes] for every element, namespace stripped. */
function parseWithPython(svg: string): [string, Record<string, string>][] {
  const script =
    'import sys, json, xml.etree.ElementTree as ET\n' +
    'root = ET.fromstring(sys.stdin.read())\n' +
    'print(json.dumps([[e.tag.split("}")[-1], e.attrib, e.text or ""] for e in root.iter()]))';
  const out = execFileSync('/usr/bin/python3', ['-c', script], { input: svg, encoding: 'utf8' });
  return (JSON.parse(out) as [string, Record<string, string>, string][]).map(([t, a, text]) => [t, { ...a, text }]);
}

describe('buildDesignSvg', () => {
  it('is well-formed XML (checked by Python xml.etree) with true-size units: width in inches matches the viewBox in inches', () => {
    const els = parseWithPython(buildDesignSvg(block(), { title: 'Nine & <patch>' }));
    const [tag, root] = els[0]!;
    expect(tag).toBe('svg');
    const [, , vbW, vbH] = root['viewBox']!.split(' ').map(Number);
    // SVG 1.1 §7.10 / CSS Values: "in" is an absolute unit, so width="Nin" with a viewBox N units wide is 1 unit = 1 in.
    expect(root['width']).toBe(`${vbW}in`);
    expect(root['height']).toBe(`${vbH}in`);
    expect(els.find(([t]) => t === 'title')![1]['text']).toBe('Nine & <patch>');
  });

  it('states the size in both units: a 30.48 cm block is 12 in (1 in = 2.54 cm exactly, by the 1959 international yard and pound agreement)', () => {
    const svg = buildDesignSvg(block({ units: 'cm', width: 30.48, height: 30.48, seams: [], lines: [[[0, 1], [30.48, 1]]] }));
    expect(svg).toMatch(/width="[\d.]+cm"/);
    // The design's own units first, the other in brackets; a viewer who works in inches reads inches first.
    expect(svg).toContain('Block 30.5 × 30.5 cm (12 × 12 in)');
    const forInchViewer = buildDesignSvg(block({ units: 'cm', width: 30.48, height: 30.48, seams: [], lines: [[[0, 1], [30.48, 1]]] }), { viewerUnits: 'in' });
    expect(forInchViewer).toContain('Block 12 × 12 in (30.5 × 30.5 cm)');
    const els = parseWithPython(svg);
    const texts = els.filter(([t]) => t === 'text').map(([, a]) => a['text']);
    expect(texts).toContain('1 in');
    expect(texts).toContain('1 cm');
  });

  it('draws the route: one path per stroke classed by kind, travel dashed, a numbered disc per pass, an arrow per stroke', () => {
    const els = parseWithPython(buildDesignSvg(block(), { route }));
    const paths = els.filter(([t, a]) => t === 'path' && a['data-pass']);
    expect(paths.map(([, a]) => a['class'])).toEqual(['stitch', 'edge', 'stitch', 'retrace']);
    for (const [, a] of paths) expect('stroke-dasharray' in a).toBe(a['class'] !== 'stitch');
    const passTexts = els.filter(([t, a]) => t === 'text' && /^\d+$/.test(a['text'] ?? '')).map(([, a]) => a['text']);
    expect(passTexts).toEqual(['1', '2']);
    const arrows = els.filter(([t, a]) => t === 'path' && a['fill'] !== undefined && a['d']?.endsWith('Z') && !a['fill-rule']);
    expect(arrows).toHaveLength(route.length);
  });

  it('points each arrow along its stroke at half its length (analytic: the midpoint of a straight stroke)', () => {
    const svg = buildDesignSvg(block(), { route: [{ pass: 1, kind: 'stitch', points: [[12, 9], [0, 9]] }] });
    const arrow = /<path d="M([\d.]+) ([\d.]+)L/.exec(svg.slice(svg.indexOf('class="arrows"')))!;
    // Stroke runs right to left through (6, 9): the tip lies left of the midpoint on y = 9.
    expect(Number(arrow[1])).toBeLessThan(6);
    expect(Number(arrow[2])).toBeCloseTo(9, 9);
  });

  it('escapes remark text and draws quilting lines plainly without a route', () => {
    const svg = buildDesignSvg(block(), { remark: 'route is "old" & stale' });
    expect(svg).toContain('route is &quot;old&quot; &amp; stale');
    expect(svg).toContain('class="quilting-lines"');
    expect(svg).not.toContain('class="route"');
  });
});

describe('buildDesignThumbnailSvg', () => {
  it('has a pixel size with the block aspect ratio and keeps every line end while thinning dense lines', () => {
    const dense = Array.from({ length: 1001 }, (_, i) => [i * 0.012, 6 + Math.sin(i / 20)] as const);
    const svg = buildDesignThumbnailSvg(block({ width: 12, height: 6, lines: [dense], seams: [] }), 96);
    const els = parseWithPython(svg);
    expect(els[0]![1]['width']).toBe('96');
    expect(els[0]![1]['height']).toBe('48');
    const d = els.find(([t, a]) => t === 'path' && a['d']?.startsWith('M0 6'))![1]['d']!;
    const points = d.split(/[ML]/).filter(Boolean);
    // Each kept point is at least side/200 = 0.06 in past the previous one along the line, so at most length/0.06 + 2 remain.
    let length = 0;
    for (let i = 1; i < dense.length; i++) length += Math.hypot(dense[i]![0] - dense[i - 1]![0], dense[i]![1] - dense[i - 1]![1]);
    expect(points.length).toBeLessThanOrEqual(Math.floor(length / 0.06) + 2);
    expect(points.length).toBeLessThan(dense.length / 2);
    expect(points[points.length - 1]).toBe(`12 ${Math.round((6 + Math.sin(50)) * 1e4) / 1e4}`);
  });
});
