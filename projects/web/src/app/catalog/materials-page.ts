import { ChangeDetectionStrategy, Component, DOCUMENT, inject, viewChild } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatDialog } from '@angular/material/dialog';
import { MatIconModule } from '@angular/material/icon';
import { firstValueFrom } from 'rxjs';
import { Session } from '../core/session';
import { trimmed } from '../shared/engineering-format';
import { CatalogTable, type CatalogColumn } from './catalog-table';
import { frequencyText, strengthText, updatedText } from './catalog-format';
import type { Material } from './catalog-types';
import { MaterialDialog } from './material-dialog';
import { MaterialsApi } from './materials-api';
import { MaterialsImportDialog } from './materials-import-dialog';

@Component({
  selector: 'lw-materials-page',
  imports: [MatButtonModule, MatIconModule, CatalogTable],
  template: `
    <lw-catalog-table [api]="api" [columns]="columns" [editor]="editor" noun="material">
      <button mat-stroked-button type="button" (click)="export()"><mat-icon>download</mat-icon>Export CSV</button>
      @if (session.canEdit()) {
        <button mat-stroked-button type="button" (click)="import()"><mat-icon>upload</mat-icon>Import CSV</button>
      }
    </lw-catalog-table>
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class MaterialsPage {
  protected readonly api = inject(MaterialsApi);
  protected readonly session = inject(Session);
  private readonly dialog = inject(MatDialog);
  private readonly document = inject(DOCUMENT);
  private readonly table = viewChild.required(CatalogTable<Material>);
  protected readonly editor = MaterialDialog;
  protected readonly columns: CatalogColumn<Material>[] = [
    { id: 'name', header: 'Name', cell: (material) => material.name, sort: 'name' },
    { id: 'dk', header: 'Dk', cell: (material) => trimmed(material.dk, 4), sort: 'dk', isNumber: true },
    { id: 'df', header: 'Df', cell: (material) => trimmed(material.df, 3), sort: 'df', isNumber: true },
    { id: 'referenceFrequency', header: 'At', cell: (material) => frequencyText(material.referenceFrequency), isNumber: true },
    { id: 'dielectricStrength', header: 'Strength', cell: (material) => strengthText(material.dielectricStrength), isNumber: true },
    { id: 'updatedAt', header: 'Updated', cell: (material) => updatedText(material.updatedAt), sort: 'updatedAt' },
  ];

  /** The server answers the CSV as an attachment, so the browser downloads it and stays on this page. */
  protected export(): void {
    const { q, state, sort } = this.table().query();
    this.document.defaultView?.location.assign(this.api.exportUrl({ q, state, sort }));
  }

  protected async import(): Promise<void> {
    const report = await firstValueFrom(this.dialog.open(MaterialsImportDialog, { width: '900px', maxWidth: '96vw' }).afterClosed());
    if (report) this.table().reload();
  }
}
