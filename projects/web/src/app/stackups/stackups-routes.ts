import type { Routes } from '@angular/router';

export const stackupsRoutes: Routes = [
  { path: '', title: 'Stackups · Linewright', loadComponent: () => import('./stackups-page').then((m) => m.StackupsPage) },
  { path: ':id', title: 'Stackup · Linewright', loadComponent: () => import('./stackup-editor-page').then((m) => m.StackupEditorPage) },
];
