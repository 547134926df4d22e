/**
 * What every catalog create/edit dialog shares: the entry and the ETag it was
 * read at, read-only unless it is a draft and the person may edit, saving as
 * create or If-Match update, field problems next to their fields, and a
 * stale-version 409 explained with a reload.
 */
import { Directive, computed, inject, signal } from '@angular/core';
import type { FormGroup } from '@angular/forms';
import { MAT_DIALOG_DATA, MatDialogRef } from '@angular/material/dialog';
import { firstValueFrom } from 'rxjs';
import { Session } from '../core/session';
import { toApiProblem } from '../core/api-problem';
import { ProblemDisplay, type FieldAliases } from '../core/problem-display';
import type { CatalogApi } from './catalog-api';
import type { CatalogEntry } from './catalog-types';

export interface EditorData<T, I = unknown> {
  /** The entry to show or edit; absent to create one. */
  entry?: T;
  /** Values a new entry starts from (e.g. the calculator's line). */
  draft?: Partial<I>;
}

@Directive()
export abstract class CatalogEditor<T extends CatalogEntry, I> {
  protected readonly data: EditorData<T, I> = inject<EditorData<T, I> | null>(MAT_DIALOG_DATA, { optional: true }) ?? {};
  private readonly dialogRef = inject<MatDialogRef<unknown, T>>(MatDialogRef);
  private readonly problems = inject(ProblemDisplay);
  protected readonly session = inject(Session);
  protected abstract readonly api: CatalogApi<T, I>;
  protected abstract readonly form: FormGroup;
  /** Request field → control path, where the form names a field differently. */
  protected readonly aliases: FieldAliases = {};

  protected readonly entry = signal<T | undefined>(this.data.entry);
  private etag = this.data.entry ? `"${this.data.entry.version}"` : undefined;
  protected readonly isNew = computed(() => this.entry() === undefined);
  protected readonly isEditable = computed(() => {
    const entry = this.entry();
    return this.session.canEdit() && (!entry || entry.state === 'draft');
  });
  protected readonly isSaving = signal(false);
  protected readonly conflict = signal<string | undefined>(undefined);

  /** The form's value as the API wants it. */
  protected abstract toInput(): I;
  /** Puts a stored entry into the form. */
  protected abstract fill(entry: T): void;

  /** Call once the form exists (end of the subclass constructor). */
  protected start(): void {
    const entry = this.entry();
    if (entry) this.fill(entry);
    if (!this.isEditable()) this.form.disable();
  }

  protected async save(): Promise<void> {
    this.form.markAllAsTouched();
    if (this.form.invalid || this.isSaving() || !this.isEditable()) return;
    this.isSaving.set(true);
    this.conflict.set(undefined);
    try {
      const entry = this.entry();
      const saved = entry ? await firstValueFrom(this.api.update(entry.id, this.etag!, this.toInput())) : await firstValueFrom(this.api.create(this.toInput()));
      this.dialogRef.close(saved.item);
    } catch (error) {
      const problem = toApiProblem(error);
      // A conflict without field problems is a stale version or a state change by someone else: explain, offer a reload.
      if (problem.isConflict && problem.errors.length === 0 && this.entry()) this.conflict.set(problem.message);
      else this.problems.report(problem, this.form, this.aliases);
    } finally {
      this.isSaving.set(false);
    }
  }

  protected async reload(): Promise<void> {
    const entry = this.entry();
    if (!entry) return;
    try {
      const latest = await firstValueFrom(this.api.get(entry.id));
      this.entry.set(latest.item);
      this.etag = latest.etag;
      this.form.enable();
      this.fill(latest.item);
      if (!this.isEditable()) this.form.disable();
      this.conflict.set(undefined);
    } catch (error) {
      this.problems.report(error);
    }
  }

  protected close(): void {
    this.dialogRef.close();
  }
}
