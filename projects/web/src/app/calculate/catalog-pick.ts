import { ChangeDetectionStrategy, Component, inject, output } from '@angular/core';
import { toObservable, toSignal } from '@angular/core/rxjs-interop';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatSelectModule } from '@angular/material/select';
import { catchError, combineLatest, map, of, switchMap } from 'rxjs';
import { ConductorsApi } from '../catalog/conductors-api';
import { MaterialsApi } from '../catalog/materials-api';
import type { Conductor, Material } from '../catalog/catalog-types';
import { Session } from '../core/session';

interface Choices {
  materials: Material[];
  conductors: Conductor[];
}

/** The team's approved materials and conductors, to fill the dielectric and conductor inputs from. */
@Component({
  selector: 'lw-catalog-pick',
  imports: [MatFormFieldModule, MatSelectModule],
  template: `
    @if (choices(); as choices) {
      <div class="pick">
        <mat-form-field appearance="outline" subscriptSizing="dynamic">
          <mat-label>Catalog material</mat-label>
          <mat-select name="catalogMaterial" (valueChange)="material.emit($event)">
            @for (entry of choices.materials; track entry.id) {
              <mat-option [value]="entry">{{ entry.name }} — Dk {{ entry.dk }}, Df {{ entry.df }}</mat-option>
            } @empty {
              <mat-option disabled>No approved materials</mat-option>
            }
          </mat-select>
        </mat-form-field>
        <mat-form-field appearance="outline" subscriptSizing="dynamic">
          <mat-label>Catalog conductor</mat-label>
          <mat-select name="catalogConductor" (valueChange)="conductor.emit($event)">
            @for (entry of choices.conductors; track entry.id) {
              <mat-option [value]="entry">{{ entry.name }}</mat-option>
            } @empty {
              <mat-option disabled>No approved conductors</mat-option>
            }
          </mat-select>
        </mat-form-field>
      </div>
    } @else if (!session.isSignedIn()) {
      <p class="note">Sign in to fill these from the team's catalog, or type the values.</p>
    }
  `,
  styles: `
    .pick { display: grid; grid-template-columns: minmax(0, 1fr); gap: 10px; }
    .note { margin: 0; font: var(--mat-sys-body-small); color: var(--mat-sys-on-surface-variant); }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class CatalogPick {
  protected readonly session = inject(Session);
  private readonly materials = inject(MaterialsApi);
  private readonly conductors = inject(ConductorsApi);
  readonly material = output<Material>();
  readonly conductor = output<Conductor>();

  protected readonly choices = toSignal(
    toObservable(this.session.isSignedIn).pipe(
      switchMap((isSignedIn) => {
        if (!isSignedIn) return of(undefined);
        const approved = { page: 1, pageSize: 100, sort: 'name', state: 'approved' as const };
        return combineLatest([this.materials.list(approved), this.conductors.list(approved)]).pipe(
          map(([materials, conductors]): Choices => ({ materials: materials.items, conductors: conductors.items })),
          // Without the catalog the inputs are still typed by hand; the picker just stays away.
          catchError(() => of(undefined)),
        );
      }),
    ),
  );
}
