import { stepResponse } from '@linewright/lines';
import { responseChart, timeScaleOf } from './time-series';

describe('responseChart', () => {
  // Rs = 10 Ω, Z0 = 50 Ω, 1 ns, open end: settles at Vs (no DC current into an open load).
  const response = stepResponse({ source: { amplitude: 3.3, resistance: 10, riseTime: 100e-12 }, line: { z0: 50, delay: 1e-9 }, load: 'open' }, { points: 512 });

  it('puts a nanosecond window on a nanosecond axis and both ends on it', () => {
    const chart = responseChart(response, { quantity: 'voltage' });
    expect(chart.xLabel).toBe('Time [ns]');
    expect(chart.yLabel).toBe('Voltage [V]');
    expect(chart.series.map((s) => s.label)).toEqual(['Source end', 'Load end']);
    expect(chart.series[1].x.at(-1)).toBeCloseTo(response.time.at(-1)! * 1e9, 9);
  });

  it('draws the threshold and the settle band around the load’s final value as reference series', () => {
    const chart = responseChart(response, { quantity: 'voltage', threshold: 1.65, band: 0.02 });
    const [threshold, band] = chart.series.slice(2);
    expect(threshold.isReference).toBe(true);
    expect(threshold.y).toEqual([1.65, 1.65]);
    // The window runs −0.3 … 24.8 ns; the reference lines span whole 5 ns steps around it, so the ticks are round.
    expect(threshold.x).toEqual([-5, 25]);
    expect(band.label).toBe('Settle band ±2 %');
    expect(band.y[0]).toBeCloseTo(3.3 * 1.02, 12);
    expect(band.y[2]).toBeNaN();
    expect(band.y[3]).toBeCloseTo(3.3 * 0.98, 12);
  });

  it('shows currents in milliamperes with the final current as the reference', () => {
    const chart = responseChart(response, { quantity: 'current' });
    // The first current into the line is Vs/(Rs + Z0) = 55 mA (Ohm’s law into Z0).
    expect(chart.yLabel).toBe('Current [mA]');
    expect(Math.max(...chart.series[0].y)).toBeCloseTo(55, 6);
    expect(chart.series[2].y).toEqual([0, 0]);
  });
});

describe('timeScaleOf', () => {
  it('reads a 5 km cable’s window in microseconds', () => {
    // 5 km of solid-polyethylene coax: velocity factor ≈ 0.66 (REFERENCES.md, rules of thumb), about 25 µs one way.
    const delay = 5e3 / (0.66 * 299_792_458);
    const long = stepResponse({ source: { amplitude: 10, resistance: 75, riseTime: 1e-6 }, line: { z0: 75, delay }, load: 'open' }, { points: 256 });
    expect(timeScaleOf(long.time).unit).toBe('µs');
  });
});
