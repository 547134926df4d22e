import { axisScale, largestMagnitude, niceStep, niceWindow } from './axis-scale';

describe('axisScale', () => {
  it('reads a 5 cm trace (about 300 ps of window) in picoseconds', () => {
    expect(axisScale(320e-12, 's')).toEqual({ factor: 1e-12, unit: 'ps' });
  });

  it('reads a board-length window of tens of nanoseconds in nanoseconds', () => {
    expect(axisScale(2.5e-8, 's')).toEqual({ factor: 1e-9, unit: 'ns' });
  });

  it('reads a 5 km cable (about 25 µs one way, a window of some hundreds) in microseconds', () => {
    expect(axisScale(9.2e-4, 's')).toEqual({ factor: 1e-6, unit: 'µs' });
  });

  it('switches to the next prefix at 1000 of the smaller one, counting 999.95 as 1000', () => {
    expect(axisScale(1e-9, 's').unit).toBe('ns');
    expect(axisScale(999.95e-12, 's').unit).toBe('ns');
    expect(axisScale(999e-12, 's').unit).toBe('ps');
  });

  it('keeps whole seconds for slow cases and never uses kiloseconds', () => {
    expect(axisScale(3, 's')).toEqual({ factor: 1, unit: 's' });
    expect(axisScale(4000, 's')).toEqual({ factor: 1, unit: 's' });
  });

  it('scales currents to milliamperes and voltages to kilovolts at most', () => {
    expect(axisScale(0.066, 'A')).toEqual({ factor: 1e-3, unit: 'mA' });
    expect(axisScale(2e5, 'V')).toEqual({ factor: 1e3, unit: 'kV' });
  });

  it('keeps the plain unit for a zero or non-finite span', () => {
    expect(axisScale(0, 'V')).toEqual({ factor: 1, unit: 'V' });
    expect(axisScale(Infinity, 's')).toEqual({ factor: 1, unit: 's' });
  });
});

describe('largestMagnitude', () => {
  it('takes the largest absolute value across arrays and skips non-finite entries', () => {
    expect(largestMagnitude([1, -7, 2], [NaN, 3, Infinity])).toBe(7);
    expect(largestMagnitude([])).toBe(0);
  });
});

describe('niceStep', () => {
  it('rounds up to 1, 2 or 5 times a power of ten', () => {
    expect(niceStep(3.9)).toBe(5);
    expect(niceStep(0.011)).toBe(0.02);
    expect(niceStep(700)).toBe(1000);
    expect(niceStep(2)).toBe(2);
  });
});

describe('niceWindow', () => {
  it('starts one whole step before 0 and ends on the first whole step after the data', () => {
    // The window of a 1 ns line ringing for 24.8 ns, with a 0.3 ns lead before the edge.
    expect(niceWindow(-0.3, 24.8)).toEqual({ start: -5, end: 25, step: 5 });
  });

  it('keeps a lead longer than one step, rounded out to a whole step', () => {
    expect(niceWindow(-3, 9)).toEqual({ start: -4, end: 10, step: 2 });
  });

  it('holds data ending on a step without adding another', () => {
    const window = niceWindow(-0.1, 1);
    expect(window.step).toBeCloseTo(0.2, 12);
    expect(window.end).toBeCloseTo(1, 12);
  });
});
