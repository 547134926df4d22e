import { ChangeDetectionStrategy, Component, inject } from '@angular/core';
import { kindLabel } from '@linewright/lines';
import { CatalogTable, type CatalogColumn } from './catalog-table';
import { updatedText } from './catalog-format';
import type { LineType } from './catalog-types';
import { LineTypeDialog } from './line-type-dialog';
import { LineTypesApi } from './line-types-api';

@Component({
  selector: 'lw-line-types-page',
  imports: [CatalogTable],
  template: `<lw-catalog-table [api]="api" [columns]="columns" [editor]="editor" noun="line type" />`,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class LineTypesPage {
  protected readonly api = inject(LineTypesApi);
  protected readonly editor = LineTypeDialog;
  protected readonly columns: CatalogColumn<LineType>[] = [
    { id: 'name', header: 'Name', cell: (lineType) => lineType.name, sort: 'name' },
    { id: 'kind', header: 'Kind', cell: (lineType) => kindLabel(lineType.kind), sort: 'kind' },
    { id: 'target', header: 'Target', cell: ({ target }) => `${target.quantity === 'zDiff' ? 'Zdiff' : 'Z0'} ${target.value} Ω ± ${target.tolerancePercent} %`, sort: 'target' },
    { id: 'tags', header: 'Tags', cell: (lineType) => lineType.tags.join(', ') || '—' },
    { id: 'updatedAt', header: 'Updated', cell: (lineType) => updatedText(lineType.updatedAt), sort: 'updatedAt' },
  ];
}
