import { Routes } from '@angular/router';
import { requireRole, signedInGuard } from './core/role-guards';

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
  {
    path: 'catalog',
    canActivate: [signedInGuard],
    loadChildren: () => import('./catalog/catalog-routes').then((m) => m.catalogRoutes),
  },
  {
    path: 'stackups',
    canActivate: [signedInGuard],
    loadChildren: () => import('./stackups/stackups-routes').then((m) => m.stackupsRoutes),
  },
  {
    // The e-mailed share link's path (server/stackups/stackup-shares.ts); read-only, no sign-in.
    path: 'shared/stackup',
    title: 'Shared impedance table · Linewright',
    loadComponent: () => import('./stackups/shared-stackup-page').then((m) => m.SharedStackupPage),
  },
  {
    path: 'account',
    title: 'Account · Linewright',
    canActivate: [signedInGuard],
    loadComponent: () => import('./account/account-page').then((m) => m.AccountPage),
  },
  {
    path: 'admin',
    title: 'Team · Linewright',
    canActivate: [requireRole('admin')],
    loadComponent: () => import('./admin/admin-page').then((m) => m.AdminPage),
  },
  {
    path: 'sign-in',
    title: 'Sign in · Linewright',
    loadComponent: () => import('./account/sign-in-page').then((m) => m.SignInPage),
  },
  {
    path: 'forgot-password',
    title: 'Forgot password · Linewright',
    loadComponent: () => import('./account/forgot-password-page').then((m) => m.ForgotPasswordPage),
  },
  {
    // The e-mailed link's path (server/auth/auth-service.ts).
    path: 'reset-password',
    title: 'New password · Linewright',
    loadComponent: () => import('./account/reset-password-page').then((m) => m.ResetPasswordPage),
  },
  {
    // The e-mailed link's path (server/invitations/invitations-service.ts).
    path: 'accept-invitation',
    title: 'Join the team · Linewright',
    loadComponent: () => import('./account/accept-invitation-page').then((m) => m.AcceptInvitationPage),
  },
  {
    path: 'not-allowed',
    title: 'Not allowed · Linewright',
    loadComponent: () => import('./core/not-allowed-page').then((m) => m.NotAllowedPage),
  },
  { path: '**', redirectTo: 'calculate' },
];
