import { ChangeDetectionStrategy, Component, computed, effect, input, model, untracked } from '@angular/core';
import { FormControl, ReactiveFormsModule } from '@angular/forms';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { MatTooltipModule } from '@angular/material/tooltip';
import type { FieldDescription, TableUnit } from '@linewright/lines';
import { fixedUnitLabel, unitChoices, unitFactor } from './unit-choices';
import { trimmed } from './engineering-format';

/**
 * One numeric input with its unit. The control holds the number in the shown
 * unit; switching the unit converts it so the physical value stays the same.
 */
@Component({
  selector: 'lw-quantity-field',
  imports: [ReactiveFormsModule, MatFormFieldModule, MatInputModule, MatTooltipModule],
  template: `
    <mat-form-field appearance="outline" subscriptSizing="dynamic">
      <mat-label>{{ field().label }}</mat-label>
      <input matInput type="number" step="any" [formControl]="control()" [name]="field().name"
             [readonly]="solvedShown() !== undefined" [class.solved]="solvedShown() !== undefined"
             [attr.aria-describedby]="field().name + '-hint'" />
      @if (choices().length > 0) {
        <select matTextSuffix class="unit" (change)="changeUnit($any($event.target).value)"
                [attr.aria-label]="field().label + ' unit'">
          @for (choice of choices(); track choice.id) {
            <option [value]="choice.id" [selected]="choice.id === unit()">{{ choice.label }}</option>
          }
        </select>
      } @else if (fixedUnit()) {
        <span matTextSuffix class="unit-fixed">{{ fixedUnit() }}</span>
      }
      <mat-hint [id]="field().name + '-hint'">{{ solvedShown() ? 'Solved for the target — change the other inputs freely.' : field().description }}</mat-hint>
      @if (control().hasError('required')) {
        <mat-error>Enter a value.</mat-error>
      } @else if (control().hasError('min')) {
        <mat-error>Must be {{ field().minExclusive ? 'more than' : 'at least' }} {{ minShown() }}.</mat-error>
      } @else if (control().hasError('max')) {
        <mat-error>Must be at most {{ maxShown() }}.</mat-error>
      }
    </mat-form-field>
  `,
  styles: `
    :host { display: block; }
    mat-form-field { width: 100%; }
    .unit {
      border: none;
      background: transparent;
      color: var(--mat-sys-on-surface-variant);
      font: inherit;
      padding-left: 4px;
      cursor: pointer;
    }
    .unit:focus-visible { outline: 2px solid var(--mat-sys-primary); border-radius: 4px; }
    .unit option { color: initial; }
    .solved { font-weight: 600; color: var(--mat-sys-primary); }
    .unit-fixed { color: var(--mat-sys-on-surface-variant); padding-left: 4px; }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class QuantityField {
  readonly field = input.required<FieldDescription>();
  readonly control = input.required<FormControl<number | null>>();
  /** The shown unit ('' for dimensionless fields). */
  readonly unit = model<TableUnit | ''>('');
  /** When this field is the unknown being solved for: its solved value, SI. */
  readonly solved = input<number | undefined>();

  protected readonly choices = computed(() => unitChoices(this.field().quantity, this.field().name));
  protected readonly fixedUnit = computed(() => fixedUnitLabel(this.field().quantity));
  protected readonly solvedShown = computed(() => {
    const solved = this.solved();
    return solved === undefined ? undefined : trimmed(solved / unitFactor(this.unit()), 5);
  });
  protected readonly minShown = computed(() => this.shown(this.field().min));
  protected readonly maxShown = computed(() => this.shown(this.field().max));

  constructor() {
    // The solved value is shown in the field itself; without an event, so it never feeds back into the solve.
    effect(() => {
      const shown = this.solvedShown();
      if (shown !== undefined) untracked(() => this.control().setValue(Number(shown), { emitEvent: false }));
    });
  }

  protected changeUnit(next: TableUnit): void {
    const value = this.control().value;
    if (value !== null && Number.isFinite(value)) {
      this.control().setValue(Number(trimmed((value * unitFactor(this.unit())) / unitFactor(next), 6)));
    }
    this.unit.set(next);
  }

  private shown(limit: number | undefined): string {
    if (limit === undefined) return '';
    const unit = this.unit();
    return `${trimmed(limit / unitFactor(unit), 4)} ${unit === 'um' ? 'µm' : unit}`.trim();
  }
}
