import { DOCUMENT, Injectable, effect, inject, signal } from '@angular/core';

const STORAGE_KEY = 'linewright.theme';

/** Light or dark, remembered in the browser; the first visit follows the system setting. */
@Injectable({ providedIn: 'root' })
export class ThemeMode {
  private readonly document = inject(DOCUMENT);
  readonly isDark = signal(this.initial());

  constructor() {
    effect(() => {
      this.document.documentElement.classList.toggle('dark-theme', this.isDark());
      this.document.defaultView?.localStorage.setItem(STORAGE_KEY, this.isDark() ? 'dark' : 'light');
    });
  }

  toggle(): void {
    this.isDark.update((dark) => !dark);
  }

  private initial(): boolean {
    const window = this.document.defaultView;
    const saved = window?.localStorage.getItem(STORAGE_KEY);
    if (saved) return saved === 'dark';
    return window?.matchMedia?.('(prefers-color-scheme: dark)').matches ?? false;
  }
}
