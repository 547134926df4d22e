import { Routes } from '@angular/router';

export const routes: Routes = [
  { path: '', pathMatch: 'full', redirectTo: 'calculate' },
  {
    path: 'calculate',
    title: 'Calculate · Linewright',
    loadComponent: () => import('./calculate/calculate-page').then((m) => m.CalculatePage),
  },
  { path: '**', redirectTo: 'calculate' },
];
