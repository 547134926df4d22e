import { Routes } from '@angular/router';

export const routes: Routes = [
  { path: '', pathMatch: 'full', redirectTo: 'calculate' },
  {
    path: 'calculate',
    title: 'Calculate · Linewright',
    loadComponent: () => import('./calculate/calculate-page').then((m) => m.CalculatePage),
  },
  {
    path: 'compare',
    title: 'Compare · Linewright',
    loadComponent: () => import('./compare/compare-page').then((m) => m.ComparePage),
  },
  {
    path: 'step-response',
    title: 'Step response · Linewright',
    loadComponent: () => import('./step-response/step-response-page').then((m) => m.StepResponsePage),
  },
  { path: '**', redirectTo: 'calculate' },
];
