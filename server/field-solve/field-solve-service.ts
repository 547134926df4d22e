/**
 * Field solves as a plain synchronous request/response job. Each request runs
 * in a worker_thread (kept and reused afterwards) under the solver's own time
 * cap, maxMillis ≤ 10 s, at which it answers with its best grid so far and a
 * warning; a hard stop GRACE_MILLIS later terminates the worker and answers
 * 503, so every request is answered within the bound. At most MAX_RUNNING
 * solves run at once (the machine's cores); more are refused with 503 and
 * Retry-After rather than queued.
 */
import { Worker } from 'node:worker_threads';
import { ESTIMATE_NOTE, FIELD_DEFAULT_MAX_MILLIS, LineInputError, type CrossSectionOptions } from '@linewright/lines';
import { specToSi } from '../calculation/spec-units';
import { Problem } from '../errors';
import type { FieldSolveAnswer, FieldSolveJob, FieldSolveMessage } from './field-solve-job';

export const FIELD_SOLVE_MAX_MILLIS = FIELD_DEFAULT_MAX_MILLIS;
/** Time beyond maxMillis for the worker to start, finish its last grid and answer before it is stopped. */
const GRACE_MILLIS = 2_000;
const MAX_RUNNING = 2;
/** A plain-JavaScript entry that registers tsx, then loads field-solve-worker.ts. */
const WORKER_URL = new URL('./field-solve-thread.mjs', import.meta.url);
const SECTION_FIELDS = ['coating', 'erAbove', 'etchAngle', 'stripTopWidth'];

export interface FieldSolveRequest {
  spec: Record<string, unknown>;
  section?: CrossSectionOptions;
  tolerance?: number;
  maxMillis?: number;
  maxCells?: number;
}

export class FieldSolver {
  private running = 0;
  /** Started workers waiting for a job: starting one costs about a second (loading the solver), a solve often less. */
  private readonly idle: Worker[] = [];

  async solve(request: FieldSolveRequest): Promise<FieldSolveAnswer & { spec: FieldSolveJob['spec']; note: string }> {
    const spec = specToSi(request.spec);
    const job: FieldSolveJob = { spec, section: request.section, tolerance: request.tolerance, maxMillis: request.maxMillis ?? FIELD_SOLVE_MAX_MILLIS, maxCells: request.maxCells };
    if (this.running >= MAX_RUNNING) {
      throw new Problem(503, 'Busy', `${MAX_RUNNING} field solves are already running; try again shortly.`, [], { 'Retry-After': '5' });
    }
    this.running += 1;
    try {
      const message = await this.run(job);
      if ('inputError' in message) {
        const { field, rule } = message.inputError;
        // Spec fields are named by their request path; section options keep their own names under `section`.
        const isSectionField = SECTION_FIELDS.some((name) => field === name || field.startsWith(`${name}.`));
        throw new LineInputError(isSectionField ? `section.${field}` : `spec.${field}`, rule);
      }
      if ('failure' in message) throw new Error(`field-solve worker failed: ${message.failure}`);
      return { spec, ...message.result, note: ESTIMATE_NOTE };
    } finally {
      this.running -= 1;
    }
  }

  /** Stops the idle workers (tests and shutdown); running ones end with their job. */
  async close(): Promise<void> {
    await Promise.all(this.idle.splice(0).map((worker) => worker.terminate()));
  }

  private run(job: FieldSolveJob): Promise<FieldSolveMessage> {
    const worker = this.idle.pop() ?? new Worker(WORKER_URL);
    // An idle worker must not keep the process alive; a busy one is awaited anyway.
    worker.ref();
    return new Promise((resolve, reject) => {
      // Only our own listeners come off: Worker keeps internal ones that start and stop its message port.
      const release = () => {
        clearTimeout(timer);
        worker.off('message', onMessage);
        worker.off('error', onError);
      };
      const onMessage = (message: FieldSolveMessage) => {
        release();
        worker.unref();
        this.idle.push(worker);
        resolve(message);
      };
      const onError = (error: Error) => {
        release();
        void worker.terminate();
        reject(error);
      };
      const timer = setTimeout(() => {
        release();
        void worker.terminate();
        reject(new Problem(503, 'Field solve timed out', `The solve did not finish within ${job.maxMillis + GRACE_MILLIS} ms; ask for a looser tolerance or fewer cells.`));
      }, job.maxMillis + GRACE_MILLIS);
      worker.on('message', onMessage);
      worker.on('error', onError);
      worker.postMessage(job);
    });
  }
}
