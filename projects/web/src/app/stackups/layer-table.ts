import { COPPER_OUNCE_THICKNESS } from '@linewright/lines';
import { ChangeDetectionStrategy, Component, input, output } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatIconModule } from '@angular/material/icon';
import { MatMenuModule } from '@angular/material/menu';
import { MatTooltipModule } from '@angular/material/tooltip';
import type { Material } from '../catalog/catalog-types';
import type { StoredLayer } from './stackup-types';

const MICROMETRE = 1e-6;
/** 1 oz copper as 1.37 mil (trade-sheet figure, as the library's COPPER_OUNCE_THICKNESS). */
const NEW_COPPER: StoredLayer = { type: 'copper', name: 'New copper', thickness: COPPER_OUNCE_THICKNESS, role: 'signal', conductorId: null };
const NEW_DIELECTRIC: StoredLayer = { type: 'dielectric', name: 'New prepreg', thickness: 0.1e-3, kind: 'prepreg', materialId: null, relativePermittivity: 4.2, lossTangent: 0.02 };

/** The new layers, and where one was inserted or removed (placements below it move by one). */
export interface LayerChange {
  layers: StoredLayer[];
  inserted?: number;
  removed?: number;
}

/**
 * The layers as an editable table, top to bottom: name, kind or role,
 * thickness in µm, and for dielectrics the catalog material or their own
 * Dk/Df (a value typed here overrides the material's). Every change emits the
 * whole new list; the page keeps it until saved.
 */
@Component({
  selector: 'lw-layer-table',
  imports: [MatButtonModule, MatIconModule, MatMenuModule, MatTooltipModule],
  template: `
    <div class="lw-table-wrap">
      <table class="lw-data-table layers" aria-label="Layers, top to bottom">
        <thead>
          <tr><th scope="col">#</th><th scope="col">Name</th><th scope="col">Kind / role</th><th scope="col">Thickness µm</th><th scope="col">Material</th><th scope="col">Dk</th><th scope="col">Df</th><th scope="col"><span class="visually-hidden">Actions</span></th></tr>
        </thead>
        <tbody>
          @for (layer of layers(); track $index; let index = $index) {
            <tr [class]="layer.type" [attr.data-layer]="index">
              <td class="lw-number">{{ index }}</td>
              <td><input class="cell" [value]="layer.name" [disabled]="!isEditable()" (change)="set(index, { name: text($event) })" [attr.aria-label]="'Name of layer ' + index" /></td>
              <td>
                @if (layer.type === 'copper') {
                  <select class="cell" [disabled]="!isEditable()" (change)="set(index, { role: text($event) })" [attr.aria-label]="'Role of layer ' + index">
                    @for (role of roles; track role) { <option [value]="role" [selected]="role === layer.role">{{ role }}</option> }
                  </select>
                } @else {
                  <select class="cell" [disabled]="!isEditable()" (change)="set(index, { kind: text($event) })" [attr.aria-label]="'Kind of layer ' + index">
                    @for (kind of kinds; track kind) { <option [value]="kind" [selected]="kind === layer.kind">{{ kind }}</option> }
                  </select>
                }
              </td>
              <td><input class="cell number" type="number" step="any" min="0" [value]="micrometres(layer.thickness)" [disabled]="!isEditable()"
                         (change)="set(index, { thickness: number($event) * micrometre })" [attr.aria-label]="'Thickness of layer ' + index + ' in micrometres'" [attr.name]="'thickness-' + index" /></td>
              @if (layer.type === 'dielectric') {
                <td>
                  <select class="cell material" [disabled]="!isEditable()" (change)="set(index, { materialId: text($event) ? +text($event) : null })" [attr.aria-label]="'Material of layer ' + index">
                    <option value="" [selected]="layer.materialId === null">own values</option>
                    @for (material of materials(); track material.id) { <option [value]="material.id" [selected]="material.id === layer.materialId">{{ material.name }}</option> }
                  </select>
                </td>
                <td><input class="cell number" type="number" step="any" min="1" [value]="layer.relativePermittivity ?? ''" [placeholder]="materialOf(layer)?.dk ?? ''" [disabled]="!isEditable()"
                           (change)="set(index, { relativePermittivity: optionalNumber($event) })" [attr.aria-label]="'Dk of layer ' + index" /></td>
                <td><input class="cell number" type="number" step="any" min="0" [value]="layer.lossTangent ?? ''" [placeholder]="materialOf(layer)?.df ?? ''" [disabled]="!isEditable()"
                           (change)="set(index, { lossTangent: optionalNumber($event) })" [attr.aria-label]="'Df of layer ' + index" /></td>
              } @else {
                <td colspan="3" class="muted">{{ layer.role === 'plane' ? 'reference plane' : layer.role === 'mixed' ? 'lines and pour (a reference)' : 'lines' }}</td>
              }
              <td class="actions">
                @if (isEditable()) {
                  <button mat-icon-button type="button" [matMenuTriggerFor]="insertMenu" [attr.aria-label]="'Insert below layer ' + index" matTooltip="Insert below"><mat-icon>add</mat-icon></button>
                  <mat-menu #insertMenu="matMenu">
                    <button mat-menu-item type="button" (click)="insert(index, newCopper)">Copper below</button>
                    <button mat-menu-item type="button" (click)="insert(index, newDielectric)">Dielectric below</button>
                  </mat-menu>
                  <button mat-icon-button type="button" (click)="remove(index)" [attr.aria-label]="'Remove layer ' + index" matTooltip="Remove"><mat-icon>delete</mat-icon></button>
                }
              </td>
            </tr>
          }
        </tbody>
      </table>
    </div>
  `,
  styles: `
    .layers td, .layers th { padding: 2px 4px; }
    tr.copper td:first-child { border-left: 4px solid #c27a35; }
    tr.dielectric td:first-child { border-left: 4px solid light-dark(#9fbf8f, #4f6b45); }
    .cell { width: 100%; min-width: 72px; box-sizing: border-box; font: inherit; color: inherit; background: transparent; border: 1px solid transparent; border-radius: 6px; padding: 4px 6px; }
    .cell:hover:not(:disabled), .cell:focus { border-color: var(--mat-sys-outline); outline: none; }
    .cell.number { text-align: right; font-family: var(--lw-number-font); min-width: 56px; max-width: 84px; }
    .cell.material { min-width: 104px; }
    input.cell:not(.number) { min-width: 96px; }
    select.cell option { color: #000; }
    .muted { color: var(--mat-sys-on-surface-variant); font: var(--mat-sys-body-small); }
    .actions { white-space: nowrap; width: 1%; }
    .visually-hidden { position: absolute; width: 1px; height: 1px; overflow: hidden; clip: rect(0 0 0 0); }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class LayerTable {
  readonly layers = input.required<readonly StoredLayer[]>();
  readonly materials = input<readonly Material[]>([]);
  readonly isEditable = input(false);
  readonly changed = output<LayerChange>();

  protected readonly micrometre = MICROMETRE;
  protected readonly roles = ['signal', 'plane', 'mixed'] as const;
  protected readonly kinds = ['core', 'prepreg', 'coating'] as const;
  protected readonly newCopper = NEW_COPPER;
  protected readonly newDielectric = NEW_DIELECTRIC;

  protected micrometres(metres: number): number {
    return Number((metres / MICROMETRE).toPrecision(6));
  }

  protected materialOf(layer: StoredLayer): Material | undefined {
    return layer.type === 'dielectric' ? this.materials().find((material) => material.id === layer.materialId) : undefined;
  }

  protected text(event: Event): string {
    return (event.target as HTMLInputElement | HTMLSelectElement).value;
  }

  protected number(event: Event): number {
    return Number(this.text(event));
  }

  protected optionalNumber(event: Event): number | null {
    const text = this.text(event);
    return text === '' ? null : Number(text);
  }

  protected set(index: number, change: Record<string, unknown>): void {
    this.changed.emit({ layers: this.layers().map((layer, at) => (at === index ? ({ ...layer, ...change } as StoredLayer) : layer)) });
  }

  protected insert(index: number, layer: StoredLayer): void {
    const layers = [...this.layers()];
    layers.splice(index + 1, 0, { ...layer });
    this.changed.emit({ layers, inserted: index + 1 });
  }

  protected remove(index: number): void {
    this.changed.emit({ layers: this.layers().filter((_, at) => at !== index), removed: index });
  }
}
