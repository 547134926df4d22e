import { ChangeDetectionStrategy, Component, inject } from '@angular/core';
import { FormArray, NonNullableFormBuilder, ReactiveFormsModule, Validators, type FormGroup, type FormControl } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatDialogModule } from '@angular/material/dialog';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatInputModule } from '@angular/material/input';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { errorText } from '../core/form-errors';
import { CatalogEditor } from './catalog-editor';
import { GHZ, KV_PER_MM } from './catalog-format';
import type { Material, MaterialInput } from './catalog-types';
import { ConflictNotice } from './conflict-notice';
import { greaterThanZero } from './catalog-validators';
import { EntryHeading } from './entry-heading';
import { MaterialsApi } from './materials-api';

type PointGroup = FormGroup<{ frequency: FormControl<number | null>; dk: FormControl<number | null>; df: FormControl<number | null> }>;

/** Limits as in the API's MaterialFields schema. */
const DK = [Validators.required, Validators.min(1), Validators.max(100)];
const DF = [Validators.min(0), Validators.max(1)];
const POSITIVE = [greaterThanZero];

@Component({
  selector: 'lw-material-dialog',
  imports: [ReactiveFormsModule, MatButtonModule, MatDialogModule, MatFormFieldModule, MatIconModule, MatInputModule, MatProgressBarModule, ConflictNotice, EntryHeading],
  templateUrl: './material-dialog.html',
  styleUrl: './catalog-dialog.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class MaterialDialog extends CatalogEditor<Material, MaterialInput> {
  protected readonly api = inject(MaterialsApi);
  private readonly formBuilder = inject(NonNullableFormBuilder);
  protected readonly errorText = errorText;
  protected override readonly aliases = { 'referenceFrequency': 'referenceFrequencyGhz', 'dielectricStrength': 'strengthKvPerMm', 'dkDfTable': 'table' };
  protected readonly form = this.formBuilder.group({
    name: ['', [Validators.required, Validators.maxLength(120)]],
    description: [''],
    dk: this.formBuilder.control<number | null>(null, DK),
    df: this.formBuilder.control<number | null>(0, DF),
    referenceFrequencyGhz: this.formBuilder.control<number | null>(1, [Validators.required, ...POSITIVE, Validators.max(1000)]),
    strengthKvPerMm: this.formBuilder.control<number | null>(null, POSITIVE),
    notes: [''],
    table: new FormArray<PointGroup>([]),
  });

  constructor() {
    super();
    this.start();
  }

  protected addPoint(point?: { frequency: number; dk: number; df: number }): void {
    this.form.controls.table.push(
      this.formBuilder.group({
        frequency: this.formBuilder.control<number | null>(point ? point.frequency / GHZ : null, [Validators.required, ...POSITIVE]),
        dk: this.formBuilder.control<number | null>(point?.dk ?? null, DK),
        df: this.formBuilder.control<number | null>(point?.df ?? null, [Validators.required, ...DF]),
      }),
    );
  }

  protected removePoint(index: number): void {
    this.form.controls.table.removeAt(index);
  }

  protected fill(material: Material): void {
    this.form.controls.table.clear();
    for (const point of material.dkDfTable ?? []) this.addPoint(point);
    this.form.patchValue({
      name: material.name,
      description: material.description ?? '',
      dk: material.dk,
      df: material.df,
      referenceFrequencyGhz: material.referenceFrequency / GHZ,
      strengthKvPerMm: material.dielectricStrength === null ? null : material.dielectricStrength / KV_PER_MM,
      notes: material.notes ?? '',
    });
  }

  protected toInput(): MaterialInput {
    const value = this.form.getRawValue();
    const table = value.table.map((point) => ({ frequency: point.frequency! * GHZ, dk: point.dk!, df: point.df! }));
    return {
      name: value.name.trim(),
      description: value.description.trim() || null,
      dk: value.dk!,
      df: value.df ?? 0,
      referenceFrequency: value.referenceFrequencyGhz! * GHZ,
      dielectricStrength: value.strengthKvPerMm === null ? null : value.strengthKvPerMm * KV_PER_MM,
      notes: value.notes.trim() || null,
      dkDfTable: table.length > 0 ? table.sort((a, b) => a.frequency - b.frequency) : null,
    } as MaterialInput;
  }
}
