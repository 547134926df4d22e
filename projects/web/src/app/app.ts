import { ChangeDetectionStrategy, Component, ViewEncapsulation, computed, inject } from '@angular/core';
import { Router, RouterLink, RouterLinkActive, RouterOutlet } from '@angular/router';
import { MatButtonModule } from '@angular/material/button';
import { MatIconModule, MatIconRegistry } from '@angular/material/icon';
import { MatMenuModule } from '@angular/material/menu';
import { MatTooltipModule } from '@angular/material/tooltip';
import { ThemeMode } from './core/theme-mode';
import { Session } from './core/session';

interface Destination {
  path: string;
  label: string;
  icon: string;
}

const EVERYONE: readonly Destination[] = [
  { path: '/calculate', label: 'Calculate', icon: 'straighten' },
  { path: '/compare', label: 'Compare', icon: 'view_column' },
  { path: '/step-response', label: 'Step response', icon: 'ssid_chart' },
  { path: '/stackups', label: 'Stackups', icon: 'layers' },
  { path: '/catalog', label: 'Catalog', icon: 'inventory_2' },
];
const ADMIN: Destination = { path: '/admin', label: 'Team', icon: 'group' };

@Component({
  selector: 'lw-root',
  imports: [RouterOutlet, RouterLink, RouterLinkActive, MatButtonModule, MatIconModule, MatMenuModule, MatTooltipModule],
  templateUrl: './app.html',
  styleUrl: './app.scss',
  // Unencapsulated: app.scss also holds the page layout classes (lw-page…) every routed screen uses; its shell rules are scoped to lw-root.
  encapsulation: ViewEncapsulation.None,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class App {
  protected readonly theme = inject(ThemeMode);
  protected readonly session = inject(Session);
  private readonly router = inject(Router);
  protected readonly destinations = computed(() => (this.session.isAdmin() ? [...EVERYONE, ADMIN] : EVERYONE));

  constructor() {
    inject(MatIconRegistry).setDefaultFontSetClass('material-symbols-outlined');
    void this.session.ready();
  }

  protected async signOut(): Promise<void> {
    await this.session.signOut();
    await this.router.navigateByUrl('/sign-in');
  }
}
