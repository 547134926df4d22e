import { ChangeDetectionStrategy, Component, computed, inject, input, signal } from '@angular/core';
import { rxResource } from '@angular/core/rxjs-interop';
import { firstValueFrom, type Observable } from 'rxjs';
import { toApiProblem, type FieldProblem } from '../core/api-problem';
import { ProblemDisplay } from '../core/problem-display';
import type { StackupUpload } from './stackup-types';

/**
 * A stackup's uploaded CSV report (fabricator reply, coupon measurement): the
 * one just uploaded, else the latest stored, and the per-row problems of a
 * refused file. Create it in a field initializer (it needs the injection context).
 */
export class UploadedReport<R> {
  private readonly display = inject(ProblemDisplay);
  private readonly uploaded = signal<R | undefined>(undefined);
  private readonly stored;
  readonly report;
  readonly problems = signal<readonly FieldProblem[]>([]);

  constructor(
    private readonly stackupId: () => number,
    load: (id: number) => Observable<{ items: StackupUpload<R>[] }>,
    private readonly send: (id: number, file: File) => Observable<StackupUpload<R>>,
  ) {
    this.stored = rxResource({ params: () => this.stackupId(), stream: ({ params }) => load(params) });
    this.report = computed(() => this.uploaded() ?? this.stored.value()?.items[0]?.report);
  }

  async upload(file: File): Promise<void> {
    this.problems.set([]);
    try {
      this.uploaded.set((await firstValueFrom(this.send(this.stackupId(), file))).report);
    } catch (error) {
      // Row errors belong beside the upload; anything else goes to the shared problem display.
      const problem = toApiProblem(error);
      if (problem.errors.length > 0) this.problems.set(problem.errors);
      else this.display.report(problem);
    }
  }
}

/** Why a refused upload stored nothing, one line per row problem. */
@Component({
  selector: 'lw-upload-problems',
  template: `
    @if (problems().length > 0) {
      <div class="problems" role="alert">
        <strong>Nothing was stored; the file has these problems:</strong>
        <ul>@for (problem of problems(); track $index) { <li><code>{{ problem.field }}</code> {{ problem.detail }}</li> }</ul>
      </div>
    }
  `,
  styles: `.problems { border: 1px solid var(--mat-sys-error); border-radius: 12px; padding: 8px 16px; color: var(--mat-sys-error); }`,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class UploadProblems {
  readonly problems = input.required<readonly FieldProblem[]>();
}
