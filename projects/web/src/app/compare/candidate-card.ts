import { ChangeDetectionStrategy, Component, computed, input, output } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatInputModule } from '@angular/material/input';
import { MatSelectModule } from '@angular/material/select';
import { lineKind, type FieldDescription, type LineKind, type LineSpec, type TableUnit } from '@linewright/lines';
import { KIND_GROUPS } from '../calculate/kind-groups';
import { trimmed } from '../shared/engineering-format';
import { unitFactor } from '../shared/unit-choices';
import { SERIES_COLOURS } from '../shared/xy-chart';
import type { Candidate } from './candidates-url';

/** Inputs a comparison shows per candidate: the geometry, Dk, Df, frequency and length. */
const SHOWN_OPTIONAL = new Set(['tanDelta', 'frequency', 'length']);

/** One candidate line, edited in place; every change emits a new candidate. */
@Component({
  selector: 'lw-candidate-card',
  imports: [MatButtonModule, MatFormFieldModule, MatIconModule, MatInputModule, MatSelectModule],
  templateUrl: './candidate-card.html',
  styleUrl: './candidate-card.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class CandidateCard {
  readonly candidate = input.required<Candidate>();
  readonly index = input.required<number>();
  readonly lengthUnit = input<TableUnit>('mm');
  readonly canRemove = input(true);
  readonly error = input<string | undefined>();
  readonly changed = output<Candidate>();
  readonly removed = output<void>();

  protected readonly kindGroups = KIND_GROUPS;
  /** The same colour as this candidate's lines in the overlaid charts. */
  protected readonly colour = computed(() => SERIES_COLOURS[this.index() % SERIES_COLOURS.length]);
  protected readonly fields = computed(() =>
    lineKind(this.candidate().spec.kind).fields.filter((field) => field.quantity !== 'boolean' && (!field.isOptional || SHOWN_OPTIONAL.has(field.name))),
  );

  protected unitOf(field: FieldDescription): TableUnit | '' {
    if (field.quantity === 'length') return this.lengthUnit();
    if (field.quantity === 'frequency') return 'GHz';
    return '';
  }

  protected unitLabel(field: FieldDescription): string {
    const unit = this.unitOf(field);
    return unit === 'um' ? 'µm' : unit;
  }

  protected shown(field: FieldDescription): string {
    const value = (this.candidate().spec as unknown as Record<string, unknown>)[field.name];
    return typeof value === 'number' ? trimmed(value / unitFactor(this.unitOf(field)), 5) : '';
  }

  protected rename(name: string): void {
    this.changed.emit({ ...this.candidate(), name });
  }

  protected setField(field: FieldDescription, text: string): void {
    const spec: Record<string, unknown> = { ...this.candidate().spec };
    if (text.trim() === '') {
      if (!field.isOptional) return;
      delete spec[field.name];
    } else {
      const value = Number(text);
      if (!Number.isFinite(value)) return;
      spec[field.name] = value * unitFactor(this.unitOf(field));
    }
    this.changed.emit({ ...this.candidate(), spec: spec as unknown as LineSpec });
  }

  /** A new kind starts from its defaults, keeping the dielectric and operating conditions. */
  protected changeKind(kind: LineKind): void {
    const previous = this.candidate().spec as unknown as Record<string, unknown>;
    const spec: Record<string, unknown> = { kind };
    for (const field of lineKind(kind).fields) {
      if (field.quantity === 'boolean') continue;
      if (field.group !== 'geometry' && previous[field.name] !== undefined) spec[field.name] = previous[field.name];
      else if (!field.isOptional) spec[field.name] = field.defaultValue;
    }
    this.changed.emit({ ...this.candidate(), spec: spec as unknown as LineSpec });
  }
}
