// Designs for the /api/designs tests (plain JSON, as a client would send them).

type Pt = [number, number];

export function block(over: Record<string, unknown> = {}): Record<string, unknown> {
  return {
    version: 1,
    units: 'in',
    width: 12,
    height: 12,
    seams: [[[6, 0], [6, 12]]],
    lines: [[[0, 3], [12, 3]], [[0, 9], [12, 9]]],
    ...over,
  };
}

/**
 * E9 of docs/engine.md §7.2: a 12 in block with its border and N vertical and N horizontal
 * lines at s/2 + n·s (s = 12/N), all quilting lines. Required length 48 + 24N; 4N odd points (the T-junctions on
 * the border); least retrace 24 for every N when the route runs (0,0) → (12,12). Edge travel is off and there
 * are no seams, so the only travel is retrace, as in the worked example.
 */
export function e9Grid(n: number): Record<string, unknown> {
  const s = 12 / n;
  const lines: Pt[][] = [
    [[0, 0], [12, 0], [12, 12], [0, 12], [0, 0]],
  ];
  for (let i = 0; i < n; i++) {
    const c = s / 2 + i * s;
    lines.push([[c, 0], [c, 12]], [[0, c], [12, c]]);
  }
  return block({ seams: [], lines, edgeTravel: false, start: [0, 0], end: [12, 12] });
}
