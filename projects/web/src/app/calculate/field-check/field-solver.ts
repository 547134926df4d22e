import { Injectable } from '@angular/core';
import { Observable } from 'rxjs';
import type { FieldSolveMessage, FieldSolveRequest } from './field-solve-messages';

/**
 * The page's handle on the field-solver Web Worker. Unsubscribing from a
 * running solve cancels it: the solve is synchronous inside the worker, so the
 * worker is terminated and a fresh one starts with the next request.
 */
@Injectable({ providedIn: 'root' })
export class FieldSolver {
  private worker: Worker | undefined;
  private nextId = 0;

  solve(request: Omit<FieldSolveRequest, 'id'>): Observable<FieldSolveMessage> {
    return new Observable<FieldSolveMessage>((subscriber) => {
      const worker = (this.worker ??= new Worker(new URL('./field-solve.worker', import.meta.url), { type: 'module' }));
      const id = ++this.nextId;
      let isFinished = false;
      const onMessage = ({ data }: MessageEvent<FieldSolveMessage>) => {
        if (data.id !== id) return;
        subscriber.next(data);
        if (data.type !== 'progress') {
          isFinished = true;
          subscriber.complete();
        }
      };
      worker.addEventListener('message', onMessage);
      worker.postMessage({ ...request, id } satisfies FieldSolveRequest);
      return () => {
        worker.removeEventListener('message', onMessage);
        if (!isFinished) {
          worker.terminate();
          if (this.worker === worker) this.worker = undefined;
        }
      };
    });
  }
}
