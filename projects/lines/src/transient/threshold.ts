/**
 * Threshold questions on a step response: when does an end first reach a
 * logic threshold, and after when does it stay past it.
 */
import { LineInputError } from '../errors';
import { requireFinite } from '../validation';
import type { StepResponse } from './circuit';
import { thresholdCrossingOfSamples, type ThresholdCrossing } from './settle';

export interface ThresholdQuestion {
  end: 'source' | 'load';
  quantity?: 'voltage' | 'current';
  /** Threshold [V] or [A]. */
  threshold: number;
  /** Default: the side on which the waveform ends. */
  direction?: 'rising' | 'falling';
}

/**
 * Method: linear interpolation between the response's samples around each
 *   crossing (settle.ts).
 * Valid:  times accurate to a fraction of the sample spacing; a crossing after
 *   the response's last sample is not seen (staysPastFrom is then null).
 */
export function thresholdCrossing(response: StepResponse, question: ThresholdQuestion): ThresholdCrossing {
  if (question.end !== 'source' && question.end !== 'load') {
    throw new LineInputError('end', "must be 'source' or 'load'");
  }
  const quantity = question.quantity ?? 'voltage';
  if (quantity !== 'voltage' && quantity !== 'current') {
    throw new LineInputError('quantity', "must be 'voltage' or 'current'");
  }
  requireFinite('threshold', question.threshold);
  return thresholdCrossingOfSamples(response.time, response[question.end][quantity], question.threshold, question.direction);
}
