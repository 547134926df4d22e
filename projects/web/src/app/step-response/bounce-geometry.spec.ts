import { stepResponse } from '@linewright/lines';
import { arrivalSteps, bounceGeometry, DIAGRAM_TOP, MAX_DRAWN_ARRIVALS, ROW_HEIGHT } from './bounce-geometry';

describe('bounceGeometry', () => {
  const delay = 1e-9;
  // Rs = 10 Ω into a 50 Ω line with an open end: ΓS = −2/3, ΓL = +1, V0 = 3.3·50/60 = 2.75 V
  // (reflection coefficient Γ = (R − Z0)/(R + Z0) and the divider V0 = Vs·Z0/(Rs + Z0)).
  const response = stepResponse({ source: { amplitude: 3.3, resistance: 10, riseTime: 0 }, line: { z0: 50, delay }, load: 'open' });
  const geometry = bounceGeometry({
    arrivals: response.arrivals,
    delay,
    reflection: { source: response.reflection.source, load: response.reflection.load! },
    amplitude: 3.3,
  });

  it('starts at the source end at t = 0 and reaches the load one delay (one row) lower', () => {
    const [first] = geometry.segments;
    expect(first.x1).toBe(geometry.sourceX);
    expect(first.y1).toBe(DIAGRAM_TOP);
    expect(first.x2).toBe(geometry.loadX);
    expect(first.y2).toBeCloseTo(DIAGRAM_TOP + ROW_HEIGHT, 9);
  });

  it('zig-zags: each segment starts where the last one ended, on the other end', () => {
    geometry.segments.slice(1).forEach((segment, i) => {
      const previous = geometry.segments[i];
      expect(segment.x1).toBe(previous.x2);
      expect(segment.y1).toBe(previous.y2);
      expect(segment.x2).not.toBe(segment.x1);
    });
  });

  it('carries V0 = Vs·(1 − ΓS)/2 on the first segment and multiplies by the Γ of each end it leaves', () => {
    const waves = geometry.segments.map((segment) => segment.wave);
    expect(waves[0]).toBeCloseTo(2.75, 12);
    expect(waves[1]).toBeCloseTo(2.75, 12); // ΓL = +1
    expect(waves[2]).toBeCloseTo(2.75 * (-2 / 3), 12); // ΓS = −2/3
    expect(waves[3]).toBeCloseTo(2.75 * (-2 / 3), 12);
  });

  it('puts source labels left of the source line and load labels right of the load line', () => {
    for (const mark of geometry.marks) {
      if (mark.arrival.end === 'source') {
        expect(mark.labelX).toBeLessThan(geometry.sourceX);
        expect(mark.anchor).toBe('end');
      } else {
        expect(mark.labelX).toBeGreaterThan(geometry.loadX);
        expect(mark.anchor).toBe('start');
      }
    }
  });

  it(`draws at most ${MAX_DRAWN_ARRIVALS} arrivals and counts the rest as omitted`, () => {
    expect(response.arrivals.length).toBeGreaterThan(MAX_DRAWN_ARRIVALS);
    expect(geometry.marks).toHaveLength(MAX_DRAWN_ARRIVALS);
    expect(geometry.omitted).toBe(response.arrivals.length - MAX_DRAWN_ARRIVALS);
    expect(geometry.height).toBeGreaterThan(geometry.bottom);
  });

  it('with a matched load has one segment and one mark, and is still one row tall', () => {
    const matched = stepResponse({ source: { amplitude: 1, resistance: 25, riseTime: 0 }, line: { z0: 50, delay }, load: { resistance: 50 } });
    const single = bounceGeometry({ arrivals: matched.arrivals, delay, reflection: { source: -1 / 3, load: 0 }, amplitude: 1 });
    expect(single.segments).toHaveLength(1);
    expect(single.bottom).toBeCloseTo(DIAGRAM_TOP + ROW_HEIGHT, 9);
  });
});

describe('arrivalSteps', () => {
  it('sum to each end’s level: the load’s steps add up to the arrival levels of the geometric series (REFERENCES.md, Time domain closed forms)', () => {
    const response = stepResponse({ source: { amplitude: 1, resistance: 25, riseTime: 0 }, line: { z0: 50, delay: 1e-9 }, load: { resistance: 200 } });
    const reflection = { source: response.reflection.source, load: response.reflection.load! };
    const steps = arrivalSteps(response.arrivals, reflection, 1);
    // The source starts at the launched V0 = Vs·Z0/(Rs + Z0) = 2/3 V; the load starts at 0.
    const level = { source: 2 / 3, load: 0 };
    response.arrivals.forEach((arrival, i) => {
      level[arrival.end] += steps[i];
      expect(level[arrival.end]).toBeCloseTo(arrival.voltage, 12);
    });
  });
});
