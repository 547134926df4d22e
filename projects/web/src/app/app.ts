import { ChangeDetectionStrategy, Component, inject } from '@angular/core';
import { RouterLink, RouterLinkActive, RouterOutlet } from '@angular/router';
import { MatButtonModule } from '@angular/material/button';
import { MatIconModule, MatIconRegistry } from '@angular/material/icon';
import { MatTooltipModule } from '@angular/material/tooltip';
import { ThemeMode } from './core/theme-mode';

interface Destination {
  path: string;
  label: string;
  icon: string;
}

@Component({
  selector: 'lw-root',
  imports: [RouterOutlet, RouterLink, RouterLinkActive, MatButtonModule, MatIconModule, MatTooltipModule],
  templateUrl: './app.html',
  styleUrl: './app.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class App {
  protected readonly theme = inject(ThemeMode);
  protected readonly destinations: Destination[] = [
    { path: '/calculate', label: 'Calculate', icon: 'straighten' },
    { path: '/compare', label: 'Compare', icon: 'view_column' },
    { path: '/step-response', label: 'Step response', icon: 'ssid_chart' },
  ];

  constructor() {
    inject(MatIconRegistry).setDefaultFontSetClass('material-symbols-outlined');
  }
}
