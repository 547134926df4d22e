import { ChangeDetectionStrategy, Component, inject } from '@angular/core';
import { CatalogTable, type CatalogColumn } from '../catalog/catalog-table';
import { updatedText } from '../catalog/catalog-format';
import { StackupDialog } from './stackup-dialog';
import { StackupsApi } from './stackups-api';
import type { Stackup } from './stackup-types';

const MILLIMETRE = 1e-3;

/** The team's stackups, in the catalog's table (search, states, pages); a name opens its entry and the editor. */
@Component({
  selector: 'lw-stackups-page',
  imports: [CatalogTable],
  template: `
    <section class="lw-page">
      <header>
        <h1>Stackups</h1>
        <p class="lead">Board stacks, the lines placed on them and the impedance table for the fabricator. Open one to edit its layers, solve widths and share the table.</p>
      </header>
      <lw-catalog-table [api]="api" [columns]="columns" [editor]="editor" noun="stackup" />
    </section>
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class StackupsPage {
  protected readonly api = inject(StackupsApi);
  protected readonly editor = StackupDialog;
  protected readonly columns: CatalogColumn<Stackup>[] = [
    { id: 'name', header: 'Name', cell: (stackup) => stackup.name, sort: 'name' },
    { id: 'copper', header: 'Copper layers', cell: (stackup) => String(stackup.layers.filter((layer) => layer.type === 'copper').length), isNumber: true },
    { id: 'thickness', header: 'Thickness', cell: (stackup) => `${(stackup.layers.reduce((sum, layer) => sum + layer.thickness, 0) / MILLIMETRE).toFixed(2)} mm`, isNumber: true },
    { id: 'lines', header: 'Lines', cell: (stackup) => String(stackup.placements.length), isNumber: true },
    { id: 'updatedAt', header: 'Updated', cell: (stackup) => updatedText(stackup.updatedAt), sort: 'updatedAt' },
  ];
}
