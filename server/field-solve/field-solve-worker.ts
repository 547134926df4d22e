/**
 * Runs field solves off the request thread, one job per message. A solve is
 * synchronous number-crunching for up to seconds; in a worker_thread it cannot
 * stall the other requests, and the parent can terminate it if it overruns.
 */
import { parentPort } from 'node:worker_threads';
// The field module alone, not the whole public API: the worker starts without mathjs and the other kinds' graphs.
import { fieldSolveLine } from '../../projects/lines/src/field/index';
import { LineInputError } from '../../projects/lines/src/errors';
import type { FieldSolveJob, FieldSolveMessage } from './field-solve-job';

async function run(job: FieldSolveJob): Promise<FieldSolveMessage> {
  try {
    const { solution, ...result } = await fieldSolveLine(job.spec, { section: job.section, tolerance: job.tolerance, maxMillis: job.maxMillis, maxCells: job.maxCells });
    return { result: { ...result, levels: solution.levels, symmetry: solution.symmetry } };
  } catch (error) {
    // Impossible input is the caller's to fix and goes back by name; anything else is a server fault.
    if (error instanceof LineInputError) return { inputError: { field: error.field, rule: error.rule } };
    return { failure: String((error as Error)?.stack ?? error) };
  }
}

parentPort!.on('message', async (job: FieldSolveJob) => parentPort!.postMessage(await run(job)));
