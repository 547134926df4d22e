/**
 * Where things go in the bounce (lattice) diagram: the two ends as vertical
 * lines, time running down, and the wave zig-zagging between them. Pure
 * numbers in SVG user units; bounce-diagram.ts draws and labels them.
 */
import type { Arrival } from '@linewright/lines';

/** Width of the drawing in SVG units; it scales to its box. */
export const DIAGRAM_WIDTH = 420;
/** Room beside each end for the arrival labels (time and level). */
export const LABEL_GUTTER = 112;
/** Space above the first departure for the end names and reflection coefficients. */
export const DIAGRAM_TOP = 64;
/** Height of one one-way delay. */
export const ROW_HEIGHT = 46;
const BOTTOM_MARGIN = 24;
/** More arrivals than this make the drawing taller than a screen; the table lists them all. */
export const MAX_DRAWN_ARRIVALS = 10;

export interface BounceSegment {
  x1: number;
  y1: number;
  x2: number;
  y2: number;
  /** Amplitude of the wave travelling along this segment [V]. */
  wave: number;
  /** Midpoint, where the wave's amplitude is written. */
  midX: number;
  midY: number;
}

export interface BounceMark {
  x: number;
  y: number;
  /** Where the label's text is anchored: outside the line, on the arrival's side. */
  labelX: number;
  anchor: 'start' | 'end';
  arrival: Arrival;
}

export interface BounceGeometry {
  width: number;
  height: number;
  sourceX: number;
  loadX: number;
  top: number;
  bottom: number;
  segments: BounceSegment[];
  marks: BounceMark[];
  /** Arrivals left out of the drawing (they are in the table). */
  omitted: number;
}

export interface BounceInputs {
  arrivals: readonly Arrival[];
  /** One-way delay [s]. */
  delay: number;
  /** Reflection coefficients at the source and the load. */
  reflection: { source: number; load: number };
  /** Open-circuit step height [V], for the waves' amplitudes. */
  amplitude: number;
  maxArrivals?: number;
}

/**
 * The height of the wave that causes each arrival [V]. The first wave leaves
 * the source with V0 = Vs·Z0/(Rs + Z0) = Vs·(1 − ΓS)/2; each reflection
 * multiplies it by the Γ of the end it meets; arrivals alternate ends one
 * delay apart (the lattice construction of H. W. Johnson and M. Graham,
 * High-Speed Digital Design, 1993; REFERENCES.md, Time domain).
 */
export function waveAmplitudes(arrivals: readonly Arrival[], reflection: { source: number; load: number }, amplitude: number): number[] {
  let wave = (amplitude * (1 - reflection.source)) / 2;
  return arrivals.map((arrival, index) => {
    if (index > 0) wave *= arrivals[index - 1].end === 'load' ? reflection.load : reflection.source;
    return wave;
  });
}

/**
 * The step an arrival makes at its end: the incoming wave plus its
 * reflection, wave·(1 + Γ) (same construction).
 */
export function arrivalSteps(arrivals: readonly Arrival[], reflection: { source: number; load: number }, amplitude: number): number[] {
  return waveAmplitudes(arrivals, reflection, amplitude).map((wave, index) => wave * (1 + reflection[arrivals[index].end]));
}

/**
 * Lays out the path from the source at t = 0 through each arrival, drawing at
 * most `maxArrivals`. Arrivals alternate ends one delay apart, so consecutive
 * arrivals join into the zig-zag; each segment carries its waveAmplitudes() value.
 */
export function bounceGeometry({ arrivals, delay, reflection, amplitude, maxArrivals = MAX_DRAWN_ARRIVALS }: BounceInputs): BounceGeometry {
  const sourceX = LABEL_GUTTER;
  const loadX = DIAGRAM_WIDTH - LABEL_GUTTER;
  const drawn = arrivals.slice(0, maxArrivals);
  const y = (time: number) => DIAGRAM_TOP + (time / delay) * ROW_HEIGHT;
  const xOf = (end: Arrival['end']) => (end === 'source' ? sourceX : loadX);
  const lastTime = drawn.at(-1)?.time ?? 0;
  const bottom = y(Math.max(lastTime, delay));

  const waves = waveAmplitudes(drawn, reflection, amplitude);
  const segments: BounceSegment[] = [];
  let from = { x: sourceX, y: DIAGRAM_TOP };
  drawn.forEach((arrival, index) => {
    const to = { x: xOf(arrival.end), y: y(arrival.time) };
    segments.push({ x1: from.x, y1: from.y, x2: to.x, y2: to.y, wave: waves[index], midX: (from.x + to.x) / 2, midY: (from.y + to.y) / 2 });
    from = to;
  });

  const LABEL_GAP = 8;
  const marks: BounceMark[] = drawn.map((arrival) => {
    const isSource = arrival.end === 'source';
    return {
      x: xOf(arrival.end),
      y: y(arrival.time),
      labelX: isSource ? sourceX - LABEL_GAP : loadX + LABEL_GAP,
      anchor: isSource ? 'end' : 'start',
      arrival,
    };
  });

  return {
    width: DIAGRAM_WIDTH,
    height: bottom + BOTTOM_MARGIN,
    sourceX,
    loadX,
    top: DIAGRAM_TOP,
    bottom,
    segments,
    marks,
    omitted: arrivals.length - drawn.length,
  };
}
