import { ChangeDetectionStrategy, Component, inject } from '@angular/core';
import { CatalogTable, type CatalogColumn } from './catalog-table';
import { conductivityText, micrometreText, updatedText } from './catalog-format';
import type { Conductor } from './catalog-types';
import { ConductorDialog } from './conductor-dialog';
import { ConductorsApi } from './conductors-api';

@Component({
  selector: 'lw-conductors-page',
  imports: [CatalogTable],
  template: `<lw-catalog-table [api]="api" [columns]="columns" [editor]="editor" noun="conductor" />`,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ConductorsPage {
  protected readonly api = inject(ConductorsApi);
  protected readonly editor = ConductorDialog;
  protected readonly columns: CatalogColumn<Conductor>[] = [
    { id: 'name', header: 'Name', cell: (conductor) => conductor.name, sort: 'name' },
    { id: 'conductivity', header: 'Conductivity', cell: (conductor) => conductivityText(conductor.conductivity), sort: 'conductivity', isNumber: true },
    { id: 'roughness', header: 'Roughness (RMS)', cell: (conductor) => micrometreText(conductor.roughness), isNumber: true },
    { id: 'foilThicknesses', header: 'Foils', cell: (conductor) => conductor.foilThicknesses.map(micrometreText).join(', ') },
    { id: 'updatedAt', header: 'Updated', cell: (conductor) => updatedText(conductor.updatedAt), sort: 'updatedAt' },
  ];
}
