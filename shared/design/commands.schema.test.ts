import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import type { Point, Polyline } from '../geometry/point.ts';
import type { DesignCommand, LineTarget } from './commands.ts';
import { designCommandSchema } from './commands.schema.ts';
import type { Design, ThreadSettings } from './design.schema.ts';

// Any finite double but −0, which JSON writes as 0 (ECMA-262 Number::toString); every other double comes
// back bit for bit, since JSON.stringify writes the shortest digits that read back to the same double.
const coordinate = fc.double({ min: -1e6, max: 1e6, noNaN: true }).map((x) => (x === 0 ? 0 : x));
const point: fc.Arbitrary<Point> = fc.tuple(coordinate, coordinate);
const polyline: fc.Arbitrary<Polyline> = fc.array(point, { minLength: 2, maxLength: 5 });
const target: fc.Arbitrary<LineTarget> = fc.constantFrom('lines', 'seams');
const index = fc.nat(500);
const indices = fc.uniqueArray(index, { maxLength: 5 });
const entries = fc.uniqueArray(index, { maxLength: 4 }).chain((is) =>
  fc.tuple(...[...is].sort((a, b) => a - b).map((i) => polyline.map((line) => ({ index: i, line })))),
);

/** Lines inside a 12 in block with two distinct points, as `designSchema` asks of a stored design. */
const blockPoint: fc.Arbitrary<Point> = fc.tuple(fc.double({ min: 0, max: 12, noNaN: true }), fc.double({ min: 0, max: 12, noNaN: true }))
  .map(([x, y]) => [x === 0 ? 0 : x, y === 0 ? 0 : y]);
const blockLine = fc.array(blockPoint, { minLength: 2, maxLength: 4 }).filter((l) => l.some((p) => p[0] !== l[0]![0] || p[1] !== l[0]![1]));
const thread: fc.Arbitrary<ThreadSettings> = fc.record(
  { spi: fc.double({ min: 4, max: 30, noNaN: true }), bobbinCapacity: fc.double({ min: 1, max: 1000, noNaN: true }) },
  { requiredKeys: [] },
);
const design: fc.Arbitrary<Design> = fc.record(
  {
    version: fc.constant(1 as const),
    units: fc.constant('in' as const),
    width: fc.constant(12),
    height: fc.constant(12),
    seams: fc.array(blockLine, { maxLength: 3 }),
    lines: fc.array(blockLine, { maxLength: 3 }),
    edgeTravel: fc.boolean(),
    start: blockPoint,
    bindingBand: fc.double({ min: 0.01, max: 1, noNaN: true }),
    thread,
    route: fc.array(blockLine, { maxLength: 2 }),
  },
  { requiredKeys: ['version', 'units', 'width', 'height', 'seams', 'lines', 'edgeTravel'] },
);
const positive = fc.double({ min: 0.01, max: 100, noNaN: true });

const { command } = fc.letrec<{ command: DesignCommand }>((tie) => ({
  command: fc.oneof(
    { maxDepth: 3, depthIdentifier: 'batch' },
    fc.record({ kind: fc.constant('addLines' as const), target, lines: fc.array(polyline, { maxLength: 3 }) }),
    fc.record({ kind: fc.constant('insertLines' as const), target, entries }),
    fc.record({ kind: fc.constant('deleteLines' as const), target, indices }),
    fc.record({ kind: fc.constant('moveLines' as const), target, indices, dx: coordinate, dy: coordinate }),
    fc.record({ kind: fc.constant('replaceLines' as const), target, entries }),
    fc.record({ kind: fc.constant('splitLine' as const), target, index, segment: index, point }),
    fc.tuple(index, index).filter(([a, b]) => a !== b).chain(([first, second]) =>
      fc.record({ kind: fc.constant('joinLines' as const), target, first: fc.constant(first), second: fc.constant(second), reverseFirst: fc.boolean(), reverseSecond: fc.boolean() })),
    fc.record({ kind: fc.constant('setStart' as const), point: fc.option(point, { nil: null }) }),
    fc.record({ kind: fc.constant('setEnd' as const), point: fc.option(point, { nil: null }) }),
    fc.record({ kind: fc.constant('setSize' as const), width: positive, height: positive }),
    fc.record({ kind: fc.constant('convertUnits' as const), units: fc.constantFrom('in' as const, 'cm' as const) }),
    fc.record({ kind: fc.constant('replaceDesign' as const), design }),
    fc.record({ kind: fc.constant('setEdgeTravel' as const), value: fc.boolean() }),
    fc.record({ kind: fc.constant('setBindingBand' as const), value: fc.option(positive, { nil: null }) }),
    fc.record({ kind: fc.constant('setThread' as const), thread: fc.option(thread, { nil: null }) }),
    fc.record({ kind: fc.constant('setRoute' as const), route: fc.option(fc.array(polyline, { maxLength: 3 }), { nil: null }) }),
    fc.record({ kind: fc.constant('batch' as const), commands: fc.array(tie('command'), { maxLength: 3, depthIdentifier: 'batch' }) }),
  ),
}));

/** Every kind of command once; the Record type makes the compiler list them all. */
const KINDS: Record<DesignCommand['kind'], true> = {
  addLines: true, insertLines: true, deleteLines: true, moveLines: true, replaceLines: true, splitLine: true, joinLines: true,
  setStart: true, setEnd: true, setSize: true, convertUnits: true, replaceDesign: true, setEdgeTravel: true,
  setBindingBand: true, setThread: true, setRoute: true, batch: true,
};

function kindsIn(cmd: DesignCommand, into: Set<string>): void {
  into.add(cmd.kind);
  if (cmd.kind === 'batch') cmd.commands.forEach((c) => kindsIn(c, into));
}

/** The storage path: written with JSON.stringify, read back with JSON.parse as `unknown`. */
function throughStorage(value: unknown): unknown {
  return JSON.parse(JSON.stringify(value)) as unknown;
}

describe('design/commands.schema: queued edits read back from storage', () => {
  it('parses every generated command back equal after a JSON round trip (fast-check, seeded)', () => {
    const seen = new Set<string>();
    fc.assert(
      fc.property(command, (cmd) => {
        kindsIn(cmd, seen);
        const parsed = designCommandSchema.safeParse(throughStorage(cmd));
        if (!parsed.success) throw new Error(`rejected ${JSON.stringify(cmd)}: ${parsed.error.message}`);
        expect(parsed.data).toEqual(cmd);
      }),
      { seed: 4711, numRuns: 600 },
    );
    // Every kind was generated, so none is missing from the schema's union.
    expect([...seen].sort()).toEqual(Object.keys(KINDS).sort());
  });

  it('fills in a stored design default on the way in (edgeTravel), as designSchema does', () => {
    const stored = { kind: 'replaceDesign', design: { version: 1, units: 'in', width: 12, height: 12, seams: [], lines: [] } };
    const parsed = designCommandSchema.safeParse(stored);
    expect(parsed.success && parsed.data.kind === 'replaceDesign' && parsed.data.design.edgeTravel).toBe(true);
  });
});

describe('design/commands.schema: malformed commands are refused, naming the place', () => {
  const cases: [string, unknown, (string | number)[]][] = [
    ['a line of one point', { kind: 'addLines', target: 'lines', lines: [[[0, 0]]] }, ['lines', 0]],
    ['NaN, which JSON stores as null', throughStorage({ kind: 'addLines', target: 'lines', lines: [[[Number.NaN, 0], [1, 1]]] }), ['lines', 0, 0, 0]],
    ['an infinite coordinate', { kind: 'setStart', point: [Infinity, 0] }, ['point', 0]],
    ['a coordinate given as text', { kind: 'setEnd', point: ['1', 2] }, ['point', 0]],
    ['an unknown line list', { kind: 'deleteLines', target: 'borders', indices: [0] }, ['target']],
    ['a repeated delete index', { kind: 'deleteLines', target: 'lines', indices: [1, 1] }, ['indices']],
    ['a negative index', { kind: 'deleteLines', target: 'seams', indices: [-1] }, ['indices', 0]],
    ['a fractional index', { kind: 'splitLine', target: 'lines', index: 1.5, segment: 0, point: [0, 0] }, ['index']],
    ['insert entries out of order', { kind: 'insertLines', target: 'lines', entries: [{ index: 3, line: [[0, 0], [1, 1]] }, { index: 1, line: [[0, 0], [1, 1]] }] }, ['entries']],
    ['a join of a line to itself', { kind: 'joinLines', target: 'lines', first: 2, second: 2, reverseFirst: false, reverseSecond: false }, ['second']],
    ['a missing field', { kind: 'moveLines', target: 'lines', indices: [0], dx: 1 }, ['dy']],
    ['a block of no size', { kind: 'setSize', width: 0, height: 12 }, ['width']],
    ['a negative binding band', { kind: 'setBindingBand', value: -0.125 }, ['value']],
    ['an unknown unit', { kind: 'convertUnits', units: 'mm' }, ['units']],
    ['a design that designSchema refuses', { kind: 'replaceDesign', design: { version: 1, units: 'in', width: -1, height: 12, seams: [], lines: [], edgeTravel: true } }, ['design', 'width']],
    ['a malformed command inside a batch', { kind: 'batch', commands: [{ kind: 'setEdgeTravel', value: true }, { kind: 'setStart' }] }, ['commands', 1, 'point']],
  ];
  it.each(cases)('refuses %s', (_, input, path) => {
    const parsed = designCommandSchema.safeParse(input);
    expect(parsed.success).toBe(false);
    if (!parsed.success) expect(parsed.error.issues.map((i) => i.path)).toContainEqual(path);
  });

  it.each([
    ['null', null],
    ['a bare kind name', 'addLines'],
    ['an unknown kind', { kind: 'explode' }],
    ['an extra field', { kind: 'setStart', point: null, colour: 'red' }],
    ['an extra field on an indexed line', { kind: 'replaceLines', target: 'lines', entries: [{ index: 0, line: [[0, 0], [1, 1]], note: 'x' }] }],
  ])('refuses %s', (_, input) => {
    expect(designCommandSchema.safeParse(input).success).toBe(false);
  });
});
