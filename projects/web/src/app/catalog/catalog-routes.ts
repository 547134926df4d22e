import type { Routes } from '@angular/router';
import { CatalogPage } from './catalog-page';

export const catalogRoutes: Routes = [
  {
    path: '',
    component: CatalogPage,
    children: [
      { path: '', pathMatch: 'full', redirectTo: 'materials' },
      { path: 'materials', title: 'Materials · Catalog · Linewright', loadComponent: () => import('./materials-page').then((m) => m.MaterialsPage) },
      { path: 'conductors', title: 'Conductors · Catalog · Linewright', loadComponent: () => import('./conductors-page').then((m) => m.ConductorsPage) },
      { path: 'line-types', title: 'Line types · Catalog · Linewright', loadComponent: () => import('./line-types-page').then((m) => m.LineTypesPage) },
    ],
  },
];
