import { ChangeDetectionStrategy, Component, computed, inject, signal } from '@angular/core';
import { FormControl, FormRecord, NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { rxResource } from '@angular/core/rxjs-interop';
import { of } from 'rxjs';
import { MatButtonModule } from '@angular/material/button';
import { MatCheckboxModule } from '@angular/material/checkbox';
import { MatDialogModule } from '@angular/material/dialog';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { MatSelectModule } from '@angular/material/select';
import { lineKind, lineKinds, type FieldDescription, type LineKind, type TableUnit } from '@linewright/lines';
import { QuantityField } from '../shared/quantity-field';
import { unitFactor } from '../shared/unit-choices';
import { engineering, trimmed } from '../shared/engineering-format';
import { errorText } from '../core/form-errors';
import { CatalogEditor } from './catalog-editor';
import type { LineType, LineTypeInput } from './catalog-types';
import { greaterThanZero } from './catalog-validators';
import { ConflictNotice } from './conflict-notice';
import { ConductorsApi } from './conductors-api';
import { EntryHeading } from './entry-heading';
import { LineTypesApi } from './line-types-api';
import { DEFAULT_TOLERANCE_PERCENT, geometryFields } from './line-geometry';
import { MaterialsApi } from './materials-api';

type GeometryControl = FormControl<number | boolean | null>;
/** Enough for a team's reference lists in one select. */
const REFERENCE_PAGE = { page: 1, pageSize: 200, sort: 'name' };
const MILLIMETRE = 1e-3;

/** Create, edit or view a line type; opened with `draft` it starts from the calculator's line. */
@Component({
  selector: 'lw-line-type-dialog',
  imports: [ReactiveFormsModule, MatButtonModule, MatCheckboxModule, MatDialogModule, MatFormFieldModule, MatInputModule, MatProgressBarModule, MatSelectModule, QuantityField, ConflictNotice, EntryHeading],
  templateUrl: './line-type-dialog.html',
  styleUrl: './catalog-dialog.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class LineTypeDialog extends CatalogEditor<LineType, LineTypeInput> {
  protected readonly api = inject(LineTypesApi);
  private readonly materialsApi = inject(MaterialsApi);
  private readonly conductorsApi = inject(ConductorsApi);
  private readonly formBuilder = inject(NonNullableFormBuilder);
  protected readonly errorText = errorText;
  protected readonly kinds = lineKinds;
  protected readonly engineering = engineering;
  protected readonly trimmed = trimmed;
  protected override readonly aliases = { lengthDefault: 'lengthMm' };

  private readonly geometry = new FormRecord<GeometryControl>({});
  protected readonly form = this.formBuilder.group({
    name: ['', [Validators.required, Validators.maxLength(120)]],
    description: [''],
    kind: ['microstrip' as LineKind, Validators.required],
    geometry: this.geometry,
    materialId: this.formBuilder.control<number | null>(null, Validators.required),
    conductorId: this.formBuilder.control<number | null>(null),
    target: this.formBuilder.group({
      quantity: ['z0' as 'z0' | 'zDiff', Validators.required],
      value: this.formBuilder.control<number | null>(50, [Validators.required, greaterThanZero, Validators.max(10000)]),
      tolerancePercent: this.formBuilder.control<number | null>(DEFAULT_TOLERANCE_PERCENT, [Validators.required, Validators.min(0), Validators.max(100)]),
    }),
    lengthMm: this.formBuilder.control<number | null>(null, [Validators.min(0)]),
    tags: [''],
  });

  protected readonly kind = signal<LineKind>('microstrip');
  protected readonly fields = computed(() => geometryFields(this.kind()));
  protected readonly isCoupled = computed(() => lineKind(this.kind()).isCoupled);
  protected readonly units = signal<Record<string, TableUnit | ''>>({});

  protected readonly materials = rxResource({ stream: () => this.materialsApi.list(REFERENCE_PAGE) });
  protected readonly conductors = rxResource({ stream: () => this.conductorsApi.list(REFERENCE_PAGE) });
  /** The list row has no computed result; the single-entry answer does. */
  protected readonly detail = rxResource({
    params: () => this.entry()?.id,
    stream: ({ params }) => (params === undefined ? of(undefined) : this.api.get(params)),
  });
  protected readonly computedResult = computed(() => this.detail.value()?.item.computed);
  /** The calculator's Dk, to say that the material's replaces it. */
  protected readonly draftEr = (this.data.draft as { er?: number } | undefined)?.er;
  protected readonly chosenMaterial = computed(() => this.materials.value()?.items.find((material) => material.id === this.materialId()));
  private readonly materialId = signal<number | null>(null);

  constructor() {
    super();
    const draft = this.data.draft;
    this.setKind(this.data.entry?.kind ?? draft?.kind ?? 'microstrip', draft?.geometry);
    if (draft && !this.data.entry) this.fillDraft(draft);
    this.start();
  }

  protected isLive(state: string): boolean {
    return state !== 'retired';
  }

  protected geometryControl(name: string): FormControl<number | null> {
    return this.geometry.controls[name] as FormControl<number | null>;
  }

  protected booleanControl(name: string): FormControl<boolean> {
    return this.geometry.controls[name] as unknown as FormControl<boolean>;
  }

  protected setUnit(name: string, unit: TableUnit | ''): void {
    this.units.update((units) => ({ ...units, [name]: unit }));
  }

  protected pickMaterial(id: number | null): void {
    this.materialId.set(id);
  }

  /** Rebuilds the geometry controls for a kind, from SI values or the kind's defaults. */
  protected setKind(kind: LineKind, geometry?: Record<string, number | boolean>): void {
    this.kind.set(kind);
    this.form.controls.kind.setValue(kind);
    const group = this.geometry;
    for (const name of Object.keys(group.controls)) group.removeControl(name, { emitEvent: false });
    const units: Record<string, TableUnit | ''> = {};
    for (const field of geometryFields(kind)) {
      units[field.name] = field.isLength ? this.session.preferredLengthUnit() : '';
      const value = geometry?.[field.name] ?? field.defaultValue;
      group.addControl(field.name, this.controlFor(field, value, units[field.name]), { emitEvent: false });
    }
    this.units.set(units);
    if (!this.data.entry && !this.data.draft) this.form.controls.target.controls.quantity.setValue(lineKind(kind).isCoupled ? 'zDiff' : 'z0');
    if (!this.isEditable()) group.disable({ emitEvent: false });
  }

  private controlFor(field: FieldDescription, value: number | boolean, unit: TableUnit | ''): GeometryControl {
    if (field.quantity === 'boolean') return new FormControl<number | boolean | null>(Boolean(value));
    const validators = [Validators.required];
    if (field.min !== undefined) validators.push(field.minExclusive ? greaterThanZero : Validators.min(field.min / unitFactor(unit)));
    return new FormControl<number | boolean | null>(Number(trimmed(Number(value) / unitFactor(unit), 6)), validators);
  }

  private fillDraft(draft: Partial<LineTypeInput>): void {
    this.form.patchValue({
      name: draft.name ?? '',
      target: draft.target ?? undefined,
      lengthMm: draft.lengthDefault ? Number(trimmed(draft.lengthDefault / MILLIMETRE, 6)) : null,
      tags: (draft.tags ?? []).join(', '),
    });
  }

  protected fill(lineType: LineType): void {
    this.setKind(lineType.kind, lineType.geometry);
    this.form.patchValue({
      name: lineType.name,
      description: lineType.description ?? '',
      materialId: lineType.materialId,
      conductorId: lineType.conductorId,
      target: lineType.target,
      lengthMm: lineType.lengthDefault === null ? null : Number(trimmed(lineType.lengthDefault / MILLIMETRE, 6)),
      tags: lineType.tags.join(', '),
    });
    this.materialId.set(lineType.materialId);
  }

  protected toInput(): LineTypeInput {
    const value = this.form.getRawValue();
    const geometry: Record<string, number | boolean> = {};
    for (const field of this.fields()) {
      const shown = value.geometry[field.name];
      geometry[field.name] = field.quantity === 'boolean' ? Boolean(shown) : Number(shown) * unitFactor(this.units()[field.name] ?? '');
    }
    return {
      name: value.name.trim(),
      description: value.description.trim() || null,
      kind: value.kind,
      geometry,
      materialId: value.materialId!,
      conductorId: value.conductorId,
      target: { quantity: value.target.quantity, value: value.target.value!, tolerancePercent: value.target.tolerancePercent! },
      lengthDefault: value.lengthMm === null ? null : value.lengthMm * MILLIMETRE,
      tags: value.tags.split(',').map((tag) => tag.trim()).filter(Boolean),
    };
  }
}
