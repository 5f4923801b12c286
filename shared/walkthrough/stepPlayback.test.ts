import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { DWELL_MS, findSewingPace, findStepAt, startPlayback, stepPlayback, type StepPlaybackEvent, type StepPlaybackState, type StepSpan } from './stepPlayback.ts';

// The route of stepTimeline.test.ts: start, stitch 5, travel 4, tie-off, start, stitch 10, tie-off (lengths from the
// 3-4-5 and 6-8-10 triangles, so every span end is exact).
const span = (start: number, end: number): StepSpan => ({ start, end, moving: end > start });
const SPANS: StepSpan[] = [span(0, 0), span(0, 5), span(5, 9), span(9, 9), span(9, 9), span(9, 19), span(19, 19)];
const PACE = 0.001; // 1 in/s: 600 stitches/min at 10 SPI

const run = (state: StepPlaybackState, ...events: StepPlaybackEvent[]) => events.reduce((s, e) => stepPlayback(SPANS, s, e), state);
const tick = (ms: number): StepPlaybackEvent => ({ type: 'tick', ms, pace: PACE });

describe('the walkthrough player', () => {
  it('plays step 1 (a start) and stops at its end: the card stays on step 1 until Play is pressed again', () => {
    let s = run(startPlayback(SPANS, 0), { type: 'playPause' });
    expect(s.phase).toBe('playing');
    s = run(s, tick(DWELL_MS / 2));
    expect(s).toMatchObject({ step: 0, phase: 'playing' });
    s = run(s, tick(DWELL_MS * 10)); // far more time than the step takes: it still stops at its end
    expect(s).toMatchObject({ step: 0, phase: 'ended', distance: 0 });
    s = run(s, { type: 'playPause' });
    expect(s).toMatchObject({ step: 1, phase: 'playing', distance: 0 });
    s = run(s, tick(4000));
    expect(s.step).toBe(1);
    expect(s.distance).toBeCloseTo(4, 9);
    s = run(s, tick(4000));
    expect(s).toMatchObject({ step: 1, phase: 'ended', distance: 5 });
  });

  it('pauses and resumes inside a step, replays it from its start, and jumps to its end', () => {
    let s = run(startPlayback(SPANS, 5), { type: 'playPause' }, tick(3000), { type: 'playPause' });
    expect(s).toMatchObject({ step: 5, phase: 'paused' });
    expect(s.distance).toBeCloseTo(12, 9);
    s = run(s, tick(3000)); // paused: time passing changes nothing
    expect(s.distance).toBeCloseTo(12, 9);
    s = run(s, { type: 'replay' });
    expect(s).toMatchObject({ step: 5, phase: 'playing', distance: 9 });
    s = run(s, { type: 'jumpToStepEnd' });
    expect(s).toMatchObject({ step: 5, phase: 'ended', distance: 19 });
  });

  it('without pausing, runs the whole route in real sewing time plus a dwell per start and tie-off', () => {
    // 19 in at 1 in/s is 19 s; steps 0, 3, 4 and 6 are starts and tie-offs.
    let s = run(startPlayback(SPANS, 0), { type: 'setPauseAtStepEnd', on: false }, { type: 'playPause' });
    s = run(s, tick(19_000 + 4 * DWELL_MS - 1));
    expect(s).toMatchObject({ step: 6, phase: 'playing' });
    s = run(s, tick(1));
    expect(s).toMatchObject({ step: 6, phase: 'ended', distance: 19 });
  });

  it('picks the step under a scrubbed needle and keeps it inside that step', () => {
    expect(findStepAt(SPANS, 0)).toBe(0);
    expect(findStepAt(SPANS, 2.5)).toBe(1);
    expect(findStepAt(SPANS, 5)).toBe(2);
    expect(findStepAt(SPANS, 9)).toBe(5);
    expect(findStepAt(SPANS, 19)).toBe(6);
    expect(run(startPlayback(SPANS, 0), { type: 'scrub', distance: 30 })).toMatchObject({ step: 6, distance: 19, phase: 'paused' });
  });

  it('paces 1× at real sewing speed: stitches per minute ÷ SPI', () => {
    // 600 stitches/min at 10 SPI: 60 in/min, so a 6 in step takes 6 s (arithmetic from the definitions).
    expect(findSewingPace('in', undefined) * 6000).toBeCloseTo(6, 12);
    // The same pace in centimetres: 1 in = 2.54 cm (exact by definition).
    expect(findSewingPace('cm', undefined)).toBeCloseTo(0.00254, 12);
    // A design's own settings, and a chosen speed over them: 300 stitches/min at 12 SPI is 25 in/min.
    expect(findSewingPace('in', { spi: 12, stitchesPerMinute: 900 }, 300) * 60_000).toBeCloseTo(25, 9);
  });
});

/** Spans as buildStepSpans makes them: passes of start, 1–3 moving steps, tie-off, laid end to end. */
const spansArb = fc.array(fc.array(fc.integer({ min: 1, max: 40 }), { minLength: 1, maxLength: 3 }), { minLength: 1, maxLength: 4 }).map((passes) => {
  const out: StepSpan[] = [];
  let at = 0;
  for (const moves of passes) {
    out.push(span(at, at));
    for (const len of moves) out.push(span(at, (at += len / 4)));
    out.push(span(at, at));
  }
  return out;
});

const eventArb: fc.Arbitrary<StepPlaybackEvent> = fc.oneof(
  fc.constant<StepPlaybackEvent>({ type: 'playPause' }),
  fc.constant<StepPlaybackEvent>({ type: 'pause' }),
  fc.constant<StepPlaybackEvent>({ type: 'replay' }),
  fc.constant<StepPlaybackEvent>({ type: 'jumpToStepEnd' }),
  fc.integer({ min: 0, max: 20_000 }).map((ms): StepPlaybackEvent => ({ type: 'tick', ms, pace: PACE })),
  fc.integer({ min: -2, max: 20 }).map((step): StepPlaybackEvent => ({ type: 'goTo', step })),
  fc.double({ min: -5, max: 150, noNaN: true }).map((distance): StepPlaybackEvent => ({ type: 'scrub', distance })),
);

describe('the walkthrough player, random sessions', () => {
  it('keeps the needle in the current step, and with pausing on never moves past a step the quilter did not ask for', () => {
    fc.assert(
      fc.property(spansArb, fc.array(eventArb, { maxLength: 60 }), (spans, events) => {
        let s = startPlayback(spans, 0);
        for (const e of events) {
          const next = stepPlayback(spans, s, e);
          const at = spans[next.step]!;
          expect(next.distance).toBeGreaterThanOrEqual(at.start - 1e-9);
          expect(next.distance).toBeLessThanOrEqual(at.end + 1e-9);
          if (next.phase === 'ended') expect(next.distance).toBeCloseTo(at.end, 9);
          if (next.step !== s.step) {
            const asked = e.type === 'goTo' || e.type === 'scrub' || (e.type === 'playPause' && s.phase === 'ended' && next.step === s.step + 1);
            expect(asked).toBe(true);
          }
          s = next;
        }
      }),
      { numRuns: 500 },
    );
  });

  it('ticks add up: playing a ms then b ms lands where playing a + b ms does (pausing on or off)', () => {
    fc.assert(
      fc.property(spansArb, fc.boolean(), fc.integer({ min: 0, max: 30_000 }), fc.integer({ min: 0, max: 30_000 }), (spans, pauseOn, a, b) => {
        const playing = stepPlayback(spans, stepPlayback(spans, startPlayback(spans, 0), { type: 'setPauseAtStepEnd', on: pauseOn }), { type: 'playPause' });
        const split = stepPlayback(spans, stepPlayback(spans, playing, { type: 'tick', ms: a, pace: PACE }), { type: 'tick', ms: b, pace: PACE });
        const whole = stepPlayback(spans, playing, { type: 'tick', ms: a + b, pace: PACE });
        expect(split.step).toBe(whole.step);
        expect(split.phase).toBe(whole.phase);
        expect(split.distance).toBeCloseTo(whole.distance, 6);
      }),
      { numRuns: 500 },
    );
  });
});
