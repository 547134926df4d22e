import { ChangeDetectionStrategy, Component, inject } from '@angular/core';
import { NonNullableFormBuilder, ReactiveFormsModule, Validators, type AbstractControl, type ValidationErrors } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatDialogModule } from '@angular/material/dialog';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { trimmed } from '../shared/engineering-format';
import { errorText } from '../core/form-errors';
import { CatalogEditor } from './catalog-editor';
import { MICROMETRE, MS_PER_M } from './catalog-format';
import type { Conductor, ConductorInput } from './catalog-types';
import { greaterThanZero } from './catalog-validators';
import { ConflictNotice } from './conflict-notice';
import { ConductorsApi } from './conductors-api';
import { EntryHeading } from './entry-heading';

/** One foil option as the API reads it: a bare number is µm here, or a number with a unit ("1 oz", "18 um"). */
const FOIL = /^\s*(\d+(?:\.\d*)?|\.\d+)\s*(oz|um|µm|mm|mil)?\s*$/i;

export function foilList(text: string): string[] {
  return text.split(/[,;]/).map((part) => part.trim()).filter(Boolean);
}

function foilOptions(control: AbstractControl): ValidationErrors | null {
  const options = foilList(String(control.value ?? ''));
  if (options.length === 0) return { foil: 'Give at least one thickness, e.g. 0.5 oz, 1 oz.' };
  if (options.length > 20) return { foil: 'At most 20 options.' };
  const wrong = options.find((option) => !FOIL.test(option) || Number.parseFloat(option) <= 0);
  return wrong ? { foil: `"${wrong}" is not a thickness such as 1 oz, 18 um or 0.035 mm.` } : null;
}

/** "18" → "18 um": the API would read a bare number as metres. */
function asQuantity(option: string): string {
  const match = FOIL.exec(option)!;
  return `${match[1]} ${(match[2] ?? 'um').replace('µm', 'um')}`;
}

@Component({
  selector: 'lw-conductor-dialog',
  imports: [ReactiveFormsModule, MatButtonModule, MatDialogModule, MatFormFieldModule, MatInputModule, MatProgressBarModule, ConflictNotice, EntryHeading],
  template: `
    <h2 mat-dialog-title>{{ isNew() ? 'New conductor' : entry()!.name }}</h2>
    <mat-dialog-content>
      <form class="lw-form" [formGroup]="form" id="conductor-form" (ngSubmit)="save()">
        <lw-entry-heading [entry]="entry()" [isEditable]="isEditable()" [canEdit]="session.canEdit()" />
        @if (conflict(); as message) { <lw-conflict-notice [message]="message" (reload)="reload()" /> }
        <mat-form-field appearance="outline">
          <mat-label>Name</mat-label>
          <input matInput formControlName="name" required maxlength="120" />
          <mat-error>{{ errorText(form.controls.name) }}</mat-error>
        </mat-form-field>
        <mat-form-field appearance="outline">
          <mat-label>Description</mat-label>
          <input matInput formControlName="description" />
        </mat-form-field>
        <div class="lw-form-row">
          <mat-form-field appearance="outline">
            <mat-label>Conductivity</mat-label>
            <input matInput type="number" step="any" formControlName="conductivityMs" required />
            <span matTextSuffix>MS/m</span>
            <mat-hint>Annealed copper 58</mat-hint>
            <mat-error>{{ errorText(form.controls.conductivityMs) }}</mat-error>
          </mat-form-field>
          <mat-form-field appearance="outline">
            <mat-label>Surface roughness (RMS)</mat-label>
            <input matInput type="number" step="any" formControlName="roughnessUm" />
            <span matTextSuffix>µm</span>
            <mat-error>{{ errorText(form.controls.roughnessUm) }}</mat-error>
          </mat-form-field>
        </div>
        <mat-form-field appearance="outline">
          <mat-label>Foil thickness options</mat-label>
          <input matInput formControlName="foils" required />
          <mat-hint>Comma-separated, e.g. "0.5 oz, 1 oz, 70 um"; a bare number is µm.</mat-hint>
          <mat-error>{{ errorText(form.controls.foils) }}</mat-error>
        </mat-form-field>
        <mat-form-field appearance="outline">
          <mat-label>Notes</mat-label>
          <textarea matInput formControlName="notes" rows="2"></textarea>
        </mat-form-field>
      </form>
      @if (isSaving()) { <mat-progress-bar mode="indeterminate" aria-label="Saving" /> }
    </mat-dialog-content>
    <mat-dialog-actions align="end">
      <button mat-button type="button" (click)="close()">{{ isEditable() ? 'Cancel' : 'Close' }}</button>
      @if (isEditable()) {
        <button mat-flat-button type="submit" form="conductor-form" [disabled]="isSaving()">{{ isNew() ? 'Save as draft' : 'Save' }}</button>
      }
    </mat-dialog-actions>
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ConductorDialog extends CatalogEditor<Conductor, ConductorInput> {
  protected readonly api = inject(ConductorsApi);
  private readonly formBuilder = inject(NonNullableFormBuilder);
  protected readonly errorText = errorText;
  protected override readonly aliases = { conductivity: 'conductivityMs', roughness: 'roughnessUm', foilThicknesses: 'foils' };
  protected readonly form = this.formBuilder.group({
    name: ['', [Validators.required, Validators.maxLength(120)]],
    description: [''],
    conductivityMs: this.formBuilder.control<number | null>(58, [Validators.required, greaterThanZero]),
    roughnessUm: this.formBuilder.control<number | null>(0, [Validators.min(0)]),
    foils: ['0.5 oz, 1 oz', foilOptions],
    notes: [''],
  });

  constructor() {
    super();
    this.start();
  }

  protected fill(conductor: Conductor): void {
    this.form.patchValue({
      name: conductor.name,
      description: conductor.description ?? '',
      conductivityMs: conductor.conductivity / MS_PER_M,
      roughnessUm: conductor.roughness / MICROMETRE,
      foils: conductor.foilThicknesses.map((thickness) => `${trimmed(thickness / MICROMETRE, 4)} um`).join(', '),
      notes: conductor.notes ?? '',
    });
  }

  protected toInput(): ConductorInput {
    const value = this.form.getRawValue();
    return {
      name: value.name.trim(),
      description: value.description.trim() || null,
      conductivity: value.conductivityMs! * MS_PER_M,
      roughness: (value.roughnessUm ?? 0) * MICROMETRE,
      foilThicknesses: foilList(value.foils).map(asQuantity),
      notes: value.notes.trim() || null,
    };
  }
}
