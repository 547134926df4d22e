import { axisScale, largestMagnitude } from './axis-scale';

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
