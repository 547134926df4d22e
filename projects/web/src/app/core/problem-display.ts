/**
 * Shows an ApiProblem where it belongs: each field problem next to the form
 * control it names (as a `server` error that `errorText` prints in the
 * control's mat-error), everything else in a snackbar.
 */
import { Injectable, inject } from '@angular/core';
import type { AbstractControl, FormGroup } from '@angular/forms';
import { MatSnackBar } from '@angular/material/snack-bar';
import { toApiProblem, type ApiProblem, type FieldProblem } from './api-problem';
import { SERVER_ERROR } from './form-errors';

const SNACKBAR_MS = 8000;

/** The control a problem's dotted path names in `form` (e.g. `target.value`, `geometry.w`), if any. */
export function controlFor(form: FormGroup, field: string): AbstractControl | undefined {
  const path = field.replace(/^\//, '').replace(/\[(\d+)\]/g, '.$1').split(/[./]/).filter(Boolean);
  // The deepest control along the path: `geometry.w` lands on `w` when the form has it, else on `geometry`.
  let control: AbstractControl | undefined = undefined;
  let cursor: AbstractControl | null = form;
  for (const part of path) {
    cursor = cursor?.get(part) ?? null;
    if (!cursor) break;
    control = cursor;
  }
  return control;
}

/** Request field name → form control path, where a form names a field differently from the API. */
export type FieldAliases = Readonly<Record<string, string>>;

/** Puts each field problem on its control; answers the problems no control took. */
export function applyFieldProblems(form: FormGroup, problems: readonly FieldProblem[], aliases: FieldAliases = {}): FieldProblem[] {
  const rest: FieldProblem[] = [];
  for (const problem of problems) {
    const control = controlFor(form, aliases[problem.field] ?? problem.field);
    if (!control || control === form) {
      rest.push(problem);
      continue;
    }
    control.setErrors({ ...(control.errors ?? {}), [SERVER_ERROR]: problem.detail.charAt(0).toUpperCase() + problem.detail.slice(1) });
    control.markAsTouched();
  }
  return rest;
}

@Injectable({ providedIn: 'root' })
export class ProblemDisplay {
  private readonly snackBar = inject(MatSnackBar);

  /** Shows the error and answers it as an ApiProblem, for callers that also react to its status. */
  report(error: unknown, form?: FormGroup, aliases?: FieldAliases): ApiProblem {
    const problem = toApiProblem(error);
    const rest = form ? applyFieldProblems(form, problem.errors, aliases) : [...problem.errors];
    const isAllOnFields = form && problem.errors.length > 0 && rest.length === 0;
    if (!isAllOnFields) {
      const extra = rest.map((entry) => `${entry.field ? `${entry.field}: ` : ''}${entry.detail}`).join('; ');
      this.notify(extra && !problem.message.includes(extra) ? `${problem.message} (${extra})` : problem.message);
    }
    return problem;
  }

  notify(message: string): void {
    this.snackBar.open(message, 'Dismiss', { duration: SNACKBAR_MS });
  }
}
