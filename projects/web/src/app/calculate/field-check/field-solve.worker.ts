/// <reference lib="webworker" />
// The field solver runs here so the page keeps answering while it refines its grids.
import { fieldSolveLine } from '@linewright/lines';
import type { FieldSolveMessage, FieldSolveRequest } from './field-solve-messages';

addEventListener('message', async ({ data }: MessageEvent<FieldSolveRequest>) => {
  const send = (message: FieldSolveMessage) => postMessage(message);
  const started = performance.now();
  try {
    const result = await fieldSolveLine(data.spec, {
      section: data.section,
      tolerance: data.tolerance,
      maxMillis: data.maxMillis,
      onProgress: (fraction, info) => send({ id: data.id, type: 'progress', fraction, cells: info.cells }),
    });
    send({ id: data.id, type: 'result', result, millis: performance.now() - started });
  } catch (error) {
    // Impossible sections and capped solves arrive as messages; the page shows them beside the form.
    send({ id: data.id, type: 'error', message: error instanceof Error ? error.message : String(error) });
  }
});
