/**
 * The step response of source → line → load, as JSON. JSON has no Infinity,
 * so a response that never settles reports `settleTime: null` (and a lattice
 * that never settles `roundTripsToSettle: null`, as the frequency-domain
 * method always does); `hasSettled` says which it is.
 */
import { ESTIMATE_NOTE, stepResponse, type EndResponse, type StepCircuit, type StepOptions, type StepResponse } from '@linewright/lines';
import { specToSi } from '../calculation/spec-units';

export interface StepResponseRequest extends StepCircuit {
  options?: StepOptions;
}

type JsonEnd = Omit<EndResponse, 'settleTime'> & { settleTime: number | null; hasSettled: boolean };

export interface StepResponseAnswer extends Omit<StepResponse, 'source' | 'load' | 'roundTripsToSettle'> {
  source: JsonEnd;
  load: JsonEnd;
  roundTripsToSettle: number | null;
  note: string;
}

export function stepResponseOf(request: StepResponseRequest): StepResponseAnswer {
  const line = 'spec' in request.line ? { ...request.line, spec: specToSi(request.line.spec as unknown as Record<string, unknown>, 'line.spec') } : request.line;
  const response = stepResponse({ source: request.source, line, load: request.load }, request.options);
  return {
    ...response,
    source: jsonEnd(response.source),
    load: jsonEnd(response.load),
    roundTripsToSettle: Number.isFinite(response.roundTripsToSettle) ? response.roundTripsToSettle : null,
    note: ESTIMATE_NOTE,
  };
}

function jsonEnd(end: EndResponse): JsonEnd {
  const hasSettled = Number.isFinite(end.settleTime);
  return { ...end, settleTime: hasSettled ? end.settleTime : null, hasSettled };
}
