import { ChangeDetectionStrategy, Component, computed, inject, input, output, viewChild } from '@angular/core';
import { FormGroupDirective, NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatInputModule } from '@angular/material/input';
import { MatSelectModule } from '@angular/material/select';
import { MatTooltipModule } from '@angular/material/tooltip';
import type { ImpedanceTableRow, StackupLayer } from '@linewright/lines';
import { errorText } from '../core/form-errors';
import type { Placement } from './stackup-types';

export interface SolveRequest {
  placementId: string;
  unknown: 'width' | 'gap';
}

export type PanelRow = ImpedanceTableRow & { placementId: string };

const MILLIMETRE = 1e-3;
const PS_PER_MM = 1e-12 / 1e-3;

/**
 * The impedance table as the fabricator will read it, computed live from the
 * working copy: one row per placed line with its target, geometry, reference
 * layers, computed impedance, delay and the spread under the fabrication
 * tolerances, with a button to solve the width (or a pair's gap) for the
 * target. Below it, a form to place another line.
 */
@Component({
  selector: 'lw-impedance-table-panel',
  imports: [ReactiveFormsModule, MatButtonModule, MatFormFieldModule, MatIconModule, MatInputModule, MatSelectModule, MatTooltipModule],
  template: `
    <div class="lw-table-wrap">
      <table class="lw-data-table impedance" aria-label="Impedance table">
        <thead>
          <tr>
            <th scope="col">Line</th><th scope="col">Layer</th><th scope="col" class="n">Target Ω</th>
            <th scope="col" class="n">Width mm</th><th scope="col" class="n">Gap mm</th><th scope="col">Reference</th>
            <th scope="col" class="n">Computed Ω</th><th scope="col" class="n">Delay ps/mm</th><th scope="col" class="n">Spread Ω</th><th scope="col">Status</th>
            <th scope="col"><span class="visually-hidden">Actions</span></th>
          </tr>
        </thead>
        <tbody>
          @for (row of rows(); track row.placementId) {
            <tr [attr.data-line]="row.label">
              <th scope="row">{{ row.label }}<div class="kind">{{ row.structure === 'pair' ? 'pair' : 'single' }} · {{ row.kind }}</div></th>
              <td>{{ row.layerName }}</td>
              <td class="n lw-number">{{ row.targetImpedance }} ±{{ percent(row.tolerance) }}</td>
              <td class="n lw-number" data-figure="width">{{ mm(row.width) }}</td>
              <td class="n lw-number">{{ row.gap === null ? '–' : mm(row.gap) }}</td>
              <td class="reference">{{ row.referenceLayers.join(' / ') }}</td>
              <td class="n lw-number" data-figure="impedance">{{ row.impedance.toFixed(2) }}</td>
              <td class="n lw-number">{{ (row.delayPerMeter / psPerMm).toFixed(3) }}</td>
              <td class="n lw-number" [class.is-warning]="!row.isSpreadWithinTolerance"
                  [matTooltip]="'Worst corners; swings: ' + swings(row)">{{ row.spreadLow.toFixed(1) }}–{{ row.spreadHigh.toFixed(1) }}</td>
              <td>
                <span class="verdict" [class.is-bad]="!row.isWithinTolerance">{{ row.isWithinTolerance ? 'meets' : 'off target' }}</span>
                @if (row.warnings.length > 0) {
                  <mat-icon class="warn" [matTooltip]="row.warnings.join(' · ')" aria-hidden="false" [attr.aria-label]="row.warnings.length + ' model warnings'">warning</mat-icon>
                }
              </td>
              <td class="actions">
                @if (isEditable()) {
                  <div class="buttons">
                  <button mat-button type="button" (click)="solve.emit({ placementId: row.placementId, unknown: 'width' })" [attr.aria-label]="'Solve width of ' + row.label">Solve width</button>
                  @if (row.structure === 'pair') {
                    <button mat-button type="button" (click)="solve.emit({ placementId: row.placementId, unknown: 'gap' })" [attr.aria-label]="'Solve gap of ' + row.label">Solve gap</button>
                  }
                  <button mat-icon-button type="button" (click)="removed.emit(row.placementId)" [attr.aria-label]="'Remove ' + row.label" matTooltip="Remove"><mat-icon>delete</mat-icon></button>
                  </div>
                }
              </td>
            </tr>
          } @empty {
            <tr><td colspan="11" class="lw-state">No lines are placed yet.</td></tr>
          }
        </tbody>
      </table>
    </div>

    @if (isEditable()) {
      <form class="add-line" [formGroup]="form" (ngSubmit)="add()" aria-label="Place a line">
        <mat-form-field appearance="outline" subscriptSizing="dynamic"><mat-label>Line</mat-label><input matInput formControlName="label" name="label" required /><mat-error>{{ errorText(form.controls.label) }}</mat-error></mat-form-field>
        <mat-form-field appearance="outline" subscriptSizing="dynamic">
          <mat-label>Layer</mat-label>
          <mat-select formControlName="layerIndex" name="layerIndex">
            @for (choice of signalLayers(); track choice.index) { <mat-option [value]="choice.index">{{ choice.name }}</mat-option> }
          </mat-select>
        </mat-form-field>
        <mat-form-field appearance="outline" subscriptSizing="dynamic">
          <mat-label>Type</mat-label>
          <mat-select formControlName="structure" name="structure"><mat-option value="single">single-ended</mat-option><mat-option value="pair">differential pair</mat-option></mat-select>
        </mat-form-field>
        <mat-form-field appearance="outline" subscriptSizing="dynamic"><mat-label>Target Ω</mat-label><input matInput type="number" step="any" formControlName="targetImpedance" name="targetImpedance" /></mat-form-field>
        <mat-form-field appearance="outline" subscriptSizing="dynamic"><mat-label>± %</mat-label><input matInput type="number" step="any" formControlName="tolerancePercent" name="tolerancePercent" /></mat-form-field>
        <mat-form-field appearance="outline" subscriptSizing="dynamic"><mat-label>Width mm</mat-label><input matInput type="number" step="any" formControlName="width" name="width" /></mat-form-field>
        @if (form.controls.structure.value === 'pair') {
          <mat-form-field appearance="outline" subscriptSizing="dynamic"><mat-label>Gap mm</mat-label><input matInput type="number" step="any" formControlName="gap" name="gap" /></mat-form-field>
        }
        <button mat-flat-button type="submit" [disabled]="form.invalid"><mat-icon>add</mat-icon>Place line</button>
      </form>
    }
  `,
  styles: `
    :host { display: flex; flex-direction: column; gap: 12px; }
    .impedance th, .impedance td { white-space: nowrap; padding: 6px 8px; }
    .impedance td.reference { white-space: normal; min-width: 80px; }
    .n { text-align: right !important; }
    .kind { font: var(--mat-sys-body-small); color: var(--mat-sys-on-surface-variant); }
    .verdict { padding: 2px 8px; border-radius: 999px; background: var(--mat-sys-primary-container); color: var(--mat-sys-on-primary-container); font: var(--mat-sys-label-medium); }
    .verdict.is-bad { background: var(--mat-sys-error-container); color: var(--mat-sys-on-error-container); }
    .is-warning { color: var(--mat-sys-error); }
    .warn { vertical-align: middle; font-size: 18px; width: 18px; height: 18px; color: var(--mat-sys-tertiary); }
    .actions { width: 1%; } .buttons { display: flex; gap: 0; align-items: center; } .buttons button[mat-button] { padding: 0 8px; min-width: 0; }
    .add-line { display: flex; flex-wrap: wrap; gap: 8px; align-items: center; }
    .add-line mat-form-field { flex: 1 1 120px; }
    .add-line mat-form-field:first-child { flex-basis: 200px; }
    .visually-hidden { position: absolute; width: 1px; height: 1px; overflow: hidden; clip: rect(0 0 0 0); }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ImpedanceTablePanel {
  readonly rows = input.required<readonly PanelRow[]>();
  readonly layers = input.required<readonly StackupLayer[]>();
  readonly isEditable = input(false);
  readonly solve = output<SolveRequest>();
  readonly removed = output<string>();
  readonly added = output<Omit<Placement, 'id'>>();

  protected readonly errorText = errorText;
  private readonly formDirective = viewChild(FormGroupDirective);
  protected readonly psPerMm = PS_PER_MM;
  protected readonly form = inject(NonNullableFormBuilder).group({
    label: ['', [Validators.required, Validators.maxLength(120)]],
    layerIndex: [1, Validators.required],
    structure: ['single' as 'single' | 'pair'],
    targetImpedance: [50, [Validators.required, Validators.min(1)]],
    tolerancePercent: [10, [Validators.required, Validators.min(0.1), Validators.max(50)]],
    width: [0.2, [Validators.required, Validators.min(0.001)]],
    gap: [0.2, [Validators.min(0.001)]],
  });

  /** Copper layers that may carry lines. */
  protected readonly signalLayers = computed(() =>
    this.layers().flatMap((layer, index) => (layer.type === 'copper' && layer.role !== 'plane' ? [{ index, name: layer.name }] : [])),
  );

  protected mm(metres: number): string {
    return (metres / MILLIMETRE).toFixed(4);
  }

  protected percent(fraction: number): string {
    return `${Number((fraction * 100).toPrecision(3))}%`;
  }

  protected swings(row: PanelRow): string {
    return row.sensitivities.map((entry) => `${entry.field} ${entry.impedanceSwing >= 0 ? '+' : ''}${entry.impedanceSwing.toFixed(2)} Ω`).join(', ');
  }

  protected add(): void {
    if (this.form.invalid) return;
    const value = this.form.getRawValue();
    this.added.emit({
      label: value.label.trim(),
      lineTypeId: null,
      layerIndex: value.layerIndex,
      structure: value.structure,
      targetImpedance: value.targetImpedance,
      tolerancePercent: value.tolerancePercent,
      width: value.width * MILLIMETRE,
      gap: value.structure === 'pair' ? value.gap * MILLIMETRE : null,
    });
    // A fresh form for the next line, the other choices kept; resetForm also clears the submitted state, so no "Required" shows.
    this.formDirective()?.resetForm({ ...value, label: '' });
  }
}
