import { ChangeDetectionStrategy, Component, input, model } from '@angular/core';
import { ReactiveFormsModule, type AbstractControl, type FormControl, type ValidationErrors } from '@angular/forms';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { trimmed } from '../shared/engineering-format';
import { factorOf, type UnitScale } from './circuit-units';

/** Greater than zero (Validators.min allows the bound itself). */
export function positive(control: AbstractControl<number | null>): ValidationErrors | null {
  const value = control.value;
  return value !== null && !(value > 0) ? { positive: true } : null;
}

/**
 * One numeric input with either a unit choice (`units`) or a fixed unit
 * (`suffix`). The control holds the number in the shown unit; switching the
 * unit converts it so the physical value stays the same.
 */
@Component({
  selector: 'lw-scaled-field',
  imports: [ReactiveFormsModule, MatFormFieldModule, MatInputModule],
  template: `
    <mat-form-field appearance="outline" subscriptSizing="dynamic">
      <mat-label>{{ label() }}</mat-label>
      <input matInput type="number" step="any" [formControl]="control()" [name]="name()" />
      @if (units().length > 0) {
        <select matTextSuffix class="unit" [attr.name]="name() + 'Unit'" [attr.aria-label]="label() + ' unit'"
                (change)="changeUnit($any($event.target).value)">
          @for (choice of units(); track choice.id) {
            <option [value]="choice.id" [selected]="choice.id === unit()">{{ choice.label }}</option>
          }
        </select>
      } @else if (suffix()) {
        <span matTextSuffix class="suffix">{{ suffix() }}</span>
      }
      @if (hint()) {
        <mat-hint>{{ hint() }}</mat-hint>
      }
      @if (control().hasError('required')) {
        <mat-error>Enter a value.</mat-error>
      } @else if (control().hasError('positive')) {
        <mat-error>Must be more than 0.</mat-error>
      } @else if (control().hasError('min')) {
        <mat-error>Must be at least {{ control().getError('min').min }}.</mat-error>
      } @else if (control().hasError('max')) {
        <mat-error>Must be at most {{ control().getError('max').max }}.</mat-error>
      }
    </mat-form-field>
  `,
  styles: `
    :host { display: block; min-width: 0; }
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
    .suffix { color: var(--mat-sys-on-surface-variant); padding-left: 4px; }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ScaledField {
  readonly label = input.required<string>();
  readonly name = input.required<string>();
  readonly control = input.required<FormControl<number | null>>();
  readonly units = input<readonly UnitScale[]>([]);
  readonly unit = model('');
  readonly suffix = input('');
  readonly hint = input('');

  protected changeUnit(next: string): void {
    const value = this.control().value;
    if (value !== null && Number.isFinite(value)) {
      const si = value * factorOf(this.units(), this.unit());
      this.control().setValue(Number(trimmed(si / factorOf(this.units(), next), 6)));
    }
    this.unit.set(next);
  }
}
