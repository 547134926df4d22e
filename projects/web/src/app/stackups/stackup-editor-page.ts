import { ChangeDetectionStrategy, Component, DOCUMENT, computed, inject, input, signal } from '@angular/core';
import { rxResource } from '@angular/core/rxjs-interop';
import { RouterLink } from '@angular/router';
import { MatButtonModule } from '@angular/material/button';
import { MatButtonToggleModule } from '@angular/material/button-toggle';
import { MatDialog } from '@angular/material/dialog';
import { MatIconModule } from '@angular/material/icon';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { MatTabsModule } from '@angular/material/tabs';
import { firstValueFrom } from 'rxjs';
import { ESTIMATE_NOTE, solveLineDimension, LineInputError } from '@linewright/lines';
import { Session } from '../core/session';
import { toApiProblem } from '../core/api-problem';
import { ProblemDisplay } from '../core/problem-display';
import { MaterialsApi } from '../catalog/materials-api';
import { CouponPanel } from './coupon-panel';
import { FabricatorPanel } from './fabricator-panel';
import { ImpedanceTablePanel, type SolveRequest } from './impedance-table-panel';
import { LayerTable, type LayerChange } from './layer-table';
import { ShareDialog, type ShareDialogData } from './share-dialog';
import { StackDrawing } from './stack-drawing';
import { liveTable, resolveLayers, shiftPlacements } from './stackup-working-copy';
import { StackupsApi } from './stackups-api';
import type { Placement, Stackup, StoredLayer } from './stackup-types';

/**
 * One stackup: the drawing of the stack beside its layers, the impedance
 * table computed live from the working copy (solve buttons, place lines),
 * saving as a new version with If-Match, the exports and the share, and the
 * fabricator's reply and coupon measurements.
 */
@Component({
  selector: 'lw-stackup-editor-page',
  imports: [RouterLink, MatButtonModule, MatButtonToggleModule, MatIconModule, MatProgressBarModule, MatTabsModule, CouponPanel, FabricatorPanel, ImpedanceTablePanel, LayerTable, StackDrawing],
  templateUrl: './stackup-editor-page.html',
  styleUrl: './stackup-editor-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class StackupEditorPage {
  /** The route's :id. */
  readonly id = input.required<string>();
  private readonly api = inject(StackupsApi);
  private readonly problems = inject(ProblemDisplay);
  private readonly dialog = inject(MatDialog);
  private readonly document = inject(DOCUMENT);
  protected readonly session = inject(Session);
  protected readonly estimateNote = ESTIMATE_NOTE;

  private readonly loaded = rxResource({ params: () => Number(this.id()), stream: ({ params }) => this.api.get(params) });
  private readonly materialsApi = inject(MaterialsApi);
  private readonly materialsPage = rxResource({ stream: () => this.materialsApi.list({ pageSize: 200, sort: 'name' }) });
  protected readonly materials = computed(() => (this.materialsPage.value()?.items ?? []).filter((material) => material.state !== 'retired'));

  /** Edits since the last save; undefined means "as stored". */
  private readonly saved = signal<{ item: Stackup; etag: string } | undefined>(undefined);
  private readonly editedLayers = signal<StoredLayer[] | undefined>(undefined);
  private readonly editedPlacements = signal<Placement[] | undefined>(undefined);
  protected readonly isZoomed = signal(true);
  protected readonly isSaving = signal(false);

  protected readonly record = computed(() => this.saved() ?? this.loaded.value());
  protected readonly stackup = computed(() => this.record()?.item);
  protected readonly layers = computed(() => this.editedLayers() ?? this.stackup()?.layers ?? []);
  protected readonly placements = computed(() => this.editedPlacements() ?? this.stackup()?.placements ?? []);
  protected readonly isDirty = computed(() => this.editedLayers() !== undefined || this.editedPlacements() !== undefined);
  protected readonly isEditable = computed(() => this.session.canEdit() && this.stackup()?.state === 'draft');
  protected readonly loadError = computed(() => (this.loaded.error() ? toApiProblem(this.loaded.error()).message : undefined));

  protected readonly resolved = computed(() => resolveLayers(this.layers(), this.materials()));
  protected readonly table = computed(() => {
    const resolved = this.resolved();
    return resolved.value ? liveTable(resolved.value, this.placements()) : { error: resolved.error! };
  });
  protected readonly drawnLines = computed(() => this.placements().map((placement) => ({ label: placement.label, layerIndex: placement.layerIndex, structure: placement.structure })));
  protected readonly totalThickness = computed(() => this.layers().reduce((sum, layer) => sum + layer.thickness, 0));

  protected changeLayers(change: LayerChange): void {
    this.editedLayers.set(change.layers);
    if (change.inserted !== undefined || change.removed !== undefined) this.editedPlacements.set(shiftPlacements(this.placements(), change));
  }

  protected addPlacement(placement: Omit<Placement, 'id'>): void {
    this.editedPlacements.set([...this.placements(), { ...placement, id: `new${Date.now().toString(36)}` }]);
  }

  protected removePlacement(placementId: string): void {
    this.editedPlacements.set(this.placements().filter((placement) => placement.id !== placementId));
  }

  /** Solves with the shared library on the working copy; saving stores it. */
  protected solve(request: SolveRequest): void {
    const layers = this.resolved().value;
    const placement = this.placements().find((entry) => entry.id === request.placementId);
    if (!layers || !placement) return;
    try {
      const solved = solveLineDimension({ layers }, placement.layerIndex, placement.structure, placement.targetImpedance, { width: placement.width, gap: placement.gap ?? undefined }, request.unknown);
      // 0.1 µm is finer than any fabricator draws; the table shows 4 decimals of a millimetre.
      const rounded = (metres: number) => Math.round(metres * 1e7) / 1e7;
      const change = request.unknown === 'gap' ? { gap: rounded(solved.dimensions.gap!) } : { width: rounded(solved.dimensions.width) };
      this.editedPlacements.set(this.placements().map((entry) => (entry.id === placement.id ? { ...entry, ...change } : entry)));
    } catch (error) {
      // An unreachable target is the library's to explain (the reachable range), not a crash.
      if (!(error instanceof LineInputError)) throw error;
      this.problems.notify(`${placement.label}: ${error.rule}`);
    }
  }

  protected discard(): void {
    this.editedLayers.set(undefined);
    this.editedPlacements.set(undefined);
  }

  protected async save(): Promise<boolean> {
    const record = this.record();
    if (!record || !this.isDirty()) return true;
    this.isSaving.set(true);
    try {
      // New placements get their ids from the server.
      const placements = this.placements().map(({ id, ...rest }) => (id.startsWith('new') ? rest : { id, ...rest }));
      const saved = await firstValueFrom(this.api.update(record.item.id, record.etag, { layers: this.layers(), placements }));
      this.saved.set(saved);
      this.discard();
      this.problems.notify(`Saved version ${saved.item.version}.`);
      return true;
    } catch (error) {
      this.problems.report(error);
      return false;
    } finally {
      this.isSaving.set(false);
    }
  }

  /** Exports what is stored: unsaved edits are saved first. */
  protected async export(format: 'csv' | 'pdf'): Promise<void> {
    const stackup = this.stackup();
    if (!stackup || (this.isDirty() && !(await this.save()))) return;
    this.document.defaultView?.open(this.api.exportUrl(stackup.id, format), '_blank');
  }

  protected async share(): Promise<void> {
    const stackup = this.stackup();
    if (!stackup || (this.isDirty() && !(await this.save()))) return;
    const data: ShareDialogData = { stackupId: stackup.id, name: stackup.name };
    this.dialog.open(ShareDialog, { data, width: '560px', maxWidth: '96vw' });
  }
}
