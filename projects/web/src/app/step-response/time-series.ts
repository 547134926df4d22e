/**
 * Waveforms as chart series on a shared time axis in automatic engineering
 * units (axis-scale.ts), with the reference levels drawn dashed.
 */
import type { StepResponse } from '@linewright/lines';
import type { XySeries } from '../shared/xy-chart';
import { axisScale, largestMagnitude, niceWindow, type AxisScale } from './axis-scale';

export interface TimeChart {
  series: XySeries[];
  xLabel: string;
  yLabel: string;
}

export interface TimeChartOptions {
  quantity: 'voltage' | 'current';
  /** Threshold level [V] drawn across the plot (voltage only). */
  threshold?: number;
  /** Settling band as a fraction of the load's final value (voltage only). */
  band?: number;
  /** Open-circuit step height [V]: the band's scale when the final value is 0, as in the library. */
  amplitude?: number;
}

/** The axis scale for a response's window: its last sample sets the prefix. */
export function timeScaleOf(time: readonly number[]): AxisScale {
  return axisScale(largestMagnitude([time[0] ?? 0, time.at(-1) ?? 0]), 's');
}

/**
 * Both ends' voltage (or current) against time, plus the threshold and the
 * settle band around the load's final value (or the final current) as
 * reference series, drawn across a window on whole time steps. The band is
 * one series whose two edges are joined by a NaN gap, so it takes one legend
 * entry and one colour.
 */
export function responseChart(response: StepResponse, options: TimeChartOptions): TimeChart {
  const time = timeScaleOf(response.time);
  const x = response.time.map((t) => t / time.factor);
  // The reference lines span a window on whole steps, which sets the chart's x range to round ticks; the waveforms stay as computed.
  const { start: first, end: last } = niceWindow(x[0], x.at(-1) ?? x[0]);
  const source = response.source[options.quantity];
  const load = response.load[options.quantity];
  const unit = options.quantity === 'voltage' ? 'V' : 'A';
  const level = axisScale(largestMagnitude(source, load), unit);
  const scaled = (values: readonly number[]) => values.map((v) => v / level.factor);
  const series: XySeries[] = [
    { label: 'Source end', x, y: scaled(source) },
    { label: 'Load end', x, y: scaled(load) },
  ];
  if (options.quantity === 'voltage') {
    if (options.threshold !== undefined && Number.isFinite(options.threshold)) {
      const y = options.threshold / level.factor;
      series.push({ label: 'Threshold', x: [first, last], y: [y, y], isReference: true });
    }
    if (options.band !== undefined && options.band > 0) {
      const final = response.load.final;
      // The library's band: band·|final|, or band·|amplitude| when the final value is 0.
      const halfWidth = options.band * Math.abs(final !== 0 ? final : (options.amplitude ?? 0));
      const high = (final + halfWidth) / level.factor;
      const low = (final - halfWidth) / level.factor;
      series.push({ label: `Settle band ±${+(options.band * 100).toPrecision(3)} %`, x: [first, last, last, first, last], y: [high, high, NaN, low, low], isReference: true });
    }
  } else {
    const final = response.load.finalCurrent / level.factor;
    series.push({ label: 'Final current', x: [first, last], y: [final, final], isReference: true });
  }
  return {
    series,
    xLabel: `Time [${time.unit}]`,
    yLabel: `${options.quantity === 'voltage' ? 'Voltage' : 'Current'} [${level.unit}]`,
  };
}
