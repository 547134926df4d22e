import { ChangeDetectionStrategy, Component, computed, inject, input, signal, type Type } from '@angular/core';
import { rxResource, toObservable, toSignal } from '@angular/core/rxjs-interop';
import { debounceTime, firstValueFrom } from 'rxjs';
import { MatButtonModule } from '@angular/material/button';
import { MatDialog } from '@angular/material/dialog';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatInputModule } from '@angular/material/input';
import { MatMenuModule } from '@angular/material/menu';
import { MatPaginatorModule, type PageEvent } from '@angular/material/paginator';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { MatSelectModule } from '@angular/material/select';
import { MatSortModule, type Sort } from '@angular/material/sort';
import { MatTableModule } from '@angular/material/table';
import { MatTooltipModule } from '@angular/material/tooltip';
import { Session } from '../core/session';
import { toApiProblem } from '../core/api-problem';
import { ProblemDisplay } from '../core/problem-display';
import type { CatalogApi } from './catalog-api';
import { entryActions, type EntryAction } from './catalog-actions';
import { CATALOG_STATES, type CatalogEntry, type CatalogState, type ListQuery } from './catalog-types';
import { ConfirmDialog, type ConfirmData } from './confirm-dialog';
import type { EditorData } from './catalog-editor';

export interface CatalogColumn<T> {
  id: string;
  header: string;
  cell: (entry: T) => string;
  /** The API's sort key, when the server sorts by this column. */
  sort?: string;
  isNumber?: boolean;
}

const SEARCH_DEBOUNCE_MS = 250;
export const PAGE_SIZES = [10, 25, 50];

/**
 * One catalog as a table: search, state filter, server-side sort and pages,
 * the state chip, and the actions the person's role allows. The editor
 * dialog (create, edit, view) is the catalog's own component.
 */
@Component({
  selector: 'lw-catalog-table',
  imports: [MatButtonModule, MatFormFieldModule, MatIconModule, MatInputModule, MatMenuModule, MatPaginatorModule, MatProgressBarModule, MatSelectModule, MatSortModule, MatTableModule, MatTooltipModule],
  templateUrl: './catalog-table.html',
  styleUrl: './catalog-table.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class CatalogTable<T extends CatalogEntry> {
  readonly api = input.required<CatalogApi<T, unknown>>();
  readonly columns = input.required<readonly CatalogColumn<T>[]>();
  readonly editor = input.required<Type<unknown>>();
  /** Singular noun for labels, e.g. 'material'. */
  readonly noun = input.required<string>();

  private readonly dialog = inject(MatDialog);
  private readonly problems = inject(ProblemDisplay);
  protected readonly session = inject(Session);
  protected readonly states = CATALOG_STATES;
  protected readonly pageSizes = PAGE_SIZES;

  protected readonly search = signal('');
  private readonly settledSearch = toSignal(toObservable(this.search).pipe(debounceTime(SEARCH_DEBOUNCE_MS)), { initialValue: '' });
  protected readonly state = signal<CatalogState | ''>('');
  protected readonly sort = signal<Sort>({ active: 'name', direction: 'asc' });
  protected readonly pageIndex = signal(0);
  protected readonly pageSize = signal(PAGE_SIZES[1]);
  protected readonly busyId = signal<number | undefined>(undefined);

  /** The list request; also what an export of this view would ask for. */
  readonly query = computed<ListQuery>(() => {
    const { active, direction } = this.sort();
    return {
      page: this.pageIndex() + 1,
      pageSize: this.pageSize(),
      q: this.settledSearch() || undefined,
      state: this.state() || undefined,
      sort: direction ? `${direction === 'desc' ? '-' : ''}${active}` : undefined,
    };
  });

  protected readonly page = rxResource({ params: () => this.query(), stream: ({ params }) => this.api().list(params) });
  protected readonly rows = computed(() => this.page.value()?.items ?? []);
  protected readonly total = computed(() => this.page.value()?.total ?? 0);
  protected readonly loadProblem = computed(() => (this.page.error() ? toApiProblem(this.page.error()).message : ''));
  protected readonly isFiltered = computed(() => !!this.settledSearch() || !!this.state());
  protected readonly shownColumns = computed(() => [...this.columns().map((column) => column.id), 'state', 'actions']);

  protected actionsFor(entry: T): EntryAction[] {
    return entryActions(entry, this.session.user());
  }

  protected setSearch(text: string): void {
    this.search.set(text);
    this.pageIndex.set(0);
  }

  protected setState(state: CatalogState | ''): void {
    this.state.set(state);
    this.pageIndex.set(0);
  }

  protected setSort(sort: Sort): void {
    this.sort.set(sort);
    this.pageIndex.set(0);
  }

  protected setPage(event: PageEvent): void {
    this.pageSize.set(event.pageSize);
    this.pageIndex.set(event.pageIndex);
  }

  reload(): void {
    this.page.reload();
  }

  protected async open(entry?: T): Promise<void> {
    const data: EditorData<T> = { entry };
    const saved = await firstValueFrom(this.dialog.open(this.editor(), { data, width: '720px', maxWidth: '96vw', autoFocus: entry ? 'first-heading' : 'first-tabbable' }).afterClosed());
    if (saved) {
      this.problems.notify(`Saved ${this.noun()} "${(saved as T).name}".`);
      this.reload();
    }
  }

  protected async act(entry: T, action: EntryAction): Promise<void> {
    if (action.kind === 'edit') return this.open(entry);
    const etag = `"${entry.version}"`;
    if (action.kind === 'delete') {
      const data: ConfirmData = { title: `Delete ${this.noun()}?`, message: `"${entry.name}" is removed from the catalog for everyone. An entry in use cannot be deleted; retire it instead.`, confirm: 'Delete' };
      const isSure = await firstValueFrom(this.dialog.open(ConfirmDialog, { data }).afterClosed());
      if (!isSure) return;
    }
    this.busyId.set(entry.id);
    try {
      if (action.kind === 'delete') {
        await firstValueFrom(this.api().remove(entry.id, etag));
        this.problems.notify(`Deleted "${entry.name}".`);
      } else {
        await firstValueFrom(this.api().changeState(entry.id, etag, action.to));
        this.problems.notify(`"${entry.name}" is ${action.to} now.`);
      }
    } catch (error) {
      // A stale version here means the list is old: the message says why, and the reload below shows the current state.
      this.problems.report(error);
    } finally {
      this.busyId.set(undefined);
      this.reload();
    }
  }
}
