import { ChangeDetectionStrategy, Component, inject } from '@angular/core';
import { RouterLink, RouterLinkActive, RouterOutlet } from '@angular/router';
import { MatTabsModule } from '@angular/material/tabs';
import { Session } from '../core/session';

@Component({
  selector: 'lw-catalog-page',
  imports: [RouterLink, RouterLinkActive, RouterOutlet, MatTabsModule],
  template: `
    <section class="lw-page">
      <header>
        <h1>Team catalog</h1>
        <p class="lead">
          The materials, conductors and line types designs may use. Entries move draft → proposed → approved → retired;
          @if (session.isAdmin()) { as an admin you approve and retire. }
          @else if (session.canEdit()) { you write and propose drafts, an admin approves. }
          @else { as a viewer you read; an engineer or admin changes entries. }
        </p>
      </header>
      <nav mat-tab-nav-bar [tabPanel]="panel" mat-stretch-tabs="false" aria-label="Catalogs">
        @for (tab of tabs; track tab.path) {
          <a mat-tab-link [routerLink]="tab.path" routerLinkActive #active="routerLinkActive" [active]="active.isActive">{{ tab.label }}</a>
        }
      </nav>
      <mat-tab-nav-panel #panel><router-outlet /></mat-tab-nav-panel>
    </section>
  `,
  styles: `mat-tab-nav-panel { display: block; padding-top: 8px; }`,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class CatalogPage {
  protected readonly session = inject(Session);
  protected readonly tabs = [
    { path: 'materials', label: 'Materials' },
    { path: 'conductors', label: 'Conductors' },
    { path: 'line-types', label: 'Line types' },
  ];
}
