import { ChangeDetectionStrategy, Component, inject } from '@angular/core';
import { rxResource } from '@angular/core/rxjs-interop';
import { NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { RouterLink } from '@angular/router';
import { MatButtonModule } from '@angular/material/button';
import { MatButtonToggleModule } from '@angular/material/button-toggle';
import { MatDialogModule } from '@angular/material/dialog';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatInputModule } from '@angular/material/input';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { MatSelectModule } from '@angular/material/select';
import { errorText } from '../core/form-errors';
import { CatalogEditor } from '../catalog/catalog-editor';
import { ConflictNotice } from '../catalog/conflict-notice';
import { EntryHeading } from '../catalog/entry-heading';
import { StackupsApi } from './stackups-api';
import type { Stackup, StackupInput } from './stackup-types';

type Source = 'template' | 'copy';

/**
 * A stackup's catalog entry: a new one from a template (2, 4, 6, 8 layers) or
 * as a copy of another; an existing one's name and description, and the way
 * into its editor.
 */
@Component({
  selector: 'lw-stackup-dialog',
  imports: [ReactiveFormsModule, RouterLink, MatButtonModule, MatButtonToggleModule, MatDialogModule, MatFormFieldModule, MatIconModule, MatInputModule, MatProgressBarModule, MatSelectModule, ConflictNotice, EntryHeading],
  template: `
    <h2 mat-dialog-title>{{ isNew() ? 'New stackup' : entry()!.name }}</h2>
    <mat-dialog-content>
      <form class="lw-form" [formGroup]="form" id="stackup-form" (ngSubmit)="save()">
        <lw-entry-heading [entry]="entry()" [isEditable]="isEditable()" [canEdit]="session.canEdit()" />
        @if (conflict(); as message) { <lw-conflict-notice [message]="message" (reload)="reload()" /> }
        <mat-form-field appearance="outline">
          <mat-label>Name</mat-label>
          <input matInput formControlName="name" name="name" required maxlength="120" />
          <mat-error>{{ errorText(form.controls.name) }}</mat-error>
        </mat-form-field>
        <mat-form-field appearance="outline">
          <mat-label>Description</mat-label>
          <textarea matInput formControlName="description" name="description" rows="2" maxlength="4000"></textarea>
        </mat-form-field>
        @if (isNew()) {
          <mat-button-toggle-group formControlName="source" aria-label="Start from" hideSingleSelectionIndicator>
            <mat-button-toggle value="template">From a template</mat-button-toggle>
            <mat-button-toggle value="copy">As a copy</mat-button-toggle>
          </mat-button-toggle-group>
          @if (form.controls.source.value === 'template') {
            <mat-form-field appearance="outline">
              <mat-label>Copper layers</mat-label>
              <mat-select formControlName="template" name="template">
                @for (count of layerCounts; track count) { <mat-option [value]="count">{{ count }} layers</mat-option> }
              </mat-select>
              <mat-hint>Typical FR-4 thicknesses near 1.6 mm with solder mask (common practice, not a fabricator's stack).</mat-hint>
            </mat-form-field>
          } @else {
            <mat-form-field appearance="outline">
              <mat-label>Copy of</mat-label>
              <mat-select formControlName="copyOf" name="copyOf">
                @for (stackup of others.value()?.items ?? []; track stackup.id) { <mat-option [value]="stackup.id">{{ stackup.name }}</mat-option> }
              </mat-select>
              <mat-error>{{ errorText(form.controls.copyOf) }}</mat-error>
            </mat-form-field>
          }
        } @else {
          <p class="summary">{{ entry()!.layers.length }} layers · {{ entry()!.placements.length }} lines placed</p>
        }
      </form>
      @if (isSaving()) { <mat-progress-bar mode="indeterminate" aria-label="Saving" /> }
    </mat-dialog-content>
    <mat-dialog-actions align="end">
      <button mat-button type="button" (click)="close()">{{ isEditable() ? 'Cancel' : 'Close' }}</button>
      @if (!isNew()) {
        <a mat-stroked-button [routerLink]="['/stackups', entry()!.id]" mat-dialog-close><mat-icon>layers</mat-icon>Open the editor</a>
      }
      @if (isEditable()) {
        <button mat-flat-button type="submit" form="stackup-form" [disabled]="isSaving()">{{ isNew() ? 'Create' : 'Save' }}</button>
      }
    </mat-dialog-actions>
  `,
  styles: `.summary { margin: 0; color: var(--mat-sys-on-surface-variant); } mat-button-toggle-group { margin-bottom: 12px; }`,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class StackupDialog extends CatalogEditor<Stackup, StackupInput> {
  protected readonly api = inject(StackupsApi);
  protected readonly errorText = errorText;
  protected readonly layerCounts = [2, 4, 6, 8] as const;
  protected readonly form = inject(NonNullableFormBuilder).group({
    name: ['', [Validators.required, Validators.maxLength(120)]],
    description: [''],
    source: ['template' as Source],
    template: [4 as 2 | 4 | 6 | 8],
    copyOf: [null as number | null],
  });
  protected readonly others = rxResource({ stream: () => this.api.list({ pageSize: 200, sort: 'name' }) });

  constructor() {
    super();
    this.start();
  }

  protected toInput(): StackupInput {
    const { name, description, source, template, copyOf } = this.form.getRawValue();
    const common = { name: name.trim(), description: description.trim() || null };
    if (!this.isNew()) return common;
    return source === 'template' ? { ...common, template } : { ...common, copyOf: copyOf ?? undefined };
  }

  protected fill(entry: Stackup): void {
    this.form.patchValue({ name: entry.name, description: entry.description ?? '' });
  }
}
