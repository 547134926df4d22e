import { ChangeDetectionStrategy, Component, computed, inject, signal } from '@angular/core';
import { firstValueFrom } from 'rxjs';
import { MatButtonModule } from '@angular/material/button';
import { MatDialogModule, MatDialogRef } from '@angular/material/dialog';
import { MatIconModule } from '@angular/material/icon';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { toApiProblem } from '../core/api-problem';
import { MATERIAL_CSV_COLUMNS, previewMaterialsCsv, withServerProblems, type CsvPreview } from './material-csv';
import { MaterialsApi, type ImportReport } from './materials-api';

/** Choose a CSV, see every row and its problems, then import all rows as drafts (or none). */
@Component({
  selector: 'lw-materials-import-dialog',
  imports: [MatButtonModule, MatDialogModule, MatIconModule, MatProgressBarModule],
  template: `
    <h2 mat-dialog-title>Import materials from CSV</h2>
    <mat-dialog-content>
      <p class="lead">Columns: <code>{{ columns }}</code>. Quantity columns take SI numbers or unit strings such as <code>1 GHz</code>.
        Every row is checked first; the import stores all rows as drafts, or none.</p>
      <div class="pick">
        <input #file type="file" hidden accept=".csv,text/csv" aria-label="CSV file" (change)="choose(file.files)" />
        <button mat-stroked-button type="button" (click)="file.click()"><mat-icon>attach_file</mat-icon>Choose a CSV file</button>
        <span>{{ fileName() || 'No file chosen' }}</span>
      </div>
      @if (preview(); as preview) {
        @for (problem of preview.fileProblems; track problem) { <p class="problem" role="alert">{{ problem }}</p> }
        <p class="summary" role="status">{{ preview.rows.length }} rows · <strong [class.problem]="badRows() > 0">{{ badRows() }} with problems</strong>
          @if (serverSaid()) { · {{ serverSaid() }} }</p>
        <div class="lw-table-wrap preview">
          <table aria-label="Rows to import">
            <thead><tr><th scope="col">Row</th><th scope="col">Name</th><th scope="col">Dk</th><th scope="col">Df</th><th scope="col">Reference frequency</th><th scope="col">Problems</th></tr></thead>
            <tbody>
              @for (row of preview.rows; track row.row) {
                <tr [class.bad]="row.problems.length > 0" [attr.data-row]="row.row">
                  <td class="lw-number">{{ row.row }}</td>
                  <td>{{ row.cells['name'] }}</td>
                  <td class="lw-number">{{ row.cells['dk'] }}</td>
                  <td class="lw-number">{{ row.cells['df'] }}</td>
                  <td class="lw-number">{{ row.cells['referenceFrequency'] }}</td>
                  <td>@if (row.problems.length === 0) { <span class="ok">OK</span> } @else { @for (problem of row.problems; track problem) { <div class="problem">{{ problem }}</div> } }</td>
                </tr>
              }
            </tbody>
          </table>
        </div>
      }
      @if (isImporting()) { <mat-progress-bar mode="indeterminate" aria-label="Importing" /> }
    </mat-dialog-content>
    <mat-dialog-actions align="end">
      <button mat-button type="button" mat-dialog-close>Cancel</button>
      <button mat-flat-button type="button" (click)="commit()" [disabled]="!canImport()">Import {{ preview()?.rows?.length ?? 0 }} materials as drafts</button>
    </mat-dialog-actions>
  `,
  styles: `
    .lead { margin-top: 0; color: var(--mat-sys-on-surface-variant); }
    .pick { display: flex; gap: 12px; align-items: center; flex-wrap: wrap; margin-bottom: 12px; }
    .problem { color: var(--mat-sys-error); margin: 0; }
    .ok { color: var(--lw-good); }
    .summary { margin: 8px 0; }
    .preview { max-height: 45vh; overflow: auto; }
    table { border-collapse: collapse; width: 100%; }
    th, td { text-align: left; padding: 6px 10px; border-bottom: 1px solid var(--mat-sys-outline-variant); vertical-align: top; }
    th { position: sticky; top: 0; background: var(--mat-sys-surface-container-high); font: var(--mat-sys-label-large); }
    tr.bad td { background: color-mix(in srgb, var(--mat-sys-error-container) 45%, transparent); }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class MaterialsImportDialog {
  private readonly api = inject(MaterialsApi);
  private readonly dialogRef = inject<MatDialogRef<MaterialsImportDialog, ImportReport>>(MatDialogRef);
  protected readonly columns = MATERIAL_CSV_COLUMNS.join(', ');
  protected readonly fileName = signal('');
  private readonly file = signal<File | undefined>(undefined);
  protected readonly preview = signal<CsvPreview | undefined>(undefined);
  protected readonly serverSaid = signal('');
  protected readonly isImporting = signal(false);
  protected readonly badRows = computed(() => this.preview()?.rows.filter((row) => row.problems.length > 0).length ?? 0);
  protected readonly canImport = computed(() => {
    const preview = this.preview();
    return !!preview && preview.rows.length > 0 && preview.fileProblems.length === 0 && this.badRows() === 0 && !this.isImporting();
  });

  protected async choose(files: FileList | null): Promise<void> {
    const file = files?.item(0);
    if (!file) return;
    this.file.set(file);
    this.fileName.set(file.name);
    this.serverSaid.set('');
    this.preview.set(previewMaterialsCsv(await file.text()));
  }

  protected async commit(): Promise<void> {
    const file = this.file();
    if (!file || !this.canImport()) return;
    this.isImporting.set(true);
    try {
      this.dialogRef.close(await firstValueFrom(this.api.importCsv(file, file.name)));
    } catch (error) {
      const problem = toApiProblem(error);
      this.preview.update((preview) => preview && withServerProblems(preview, problem.errors));
      this.serverSaid.set(problem.errors.length > 0 ? `The server found problems: ${problem.message}` : problem.message);
    } finally {
      this.isImporting.set(false);
    }
  }
}
