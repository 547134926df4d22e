import { ChangeDetectionStrategy, Component, inject, input, signal } from '@angular/core';
import { NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { Router, RouterLink } from '@angular/router';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { Session } from '../core/session';
import { toApiProblem } from '../core/api-problem';
import { errorText } from '../core/form-errors';
import { applyFieldProblems } from '../core/problem-display';

/** Only paths inside the app, so a crafted link cannot send someone elsewhere after signing in. */
function safeReturn(url: string | undefined): string {
  return url && url.startsWith('/') && !url.startsWith('//') ? url : '/calculate';
}

@Component({
  selector: 'lw-sign-in-page',
  imports: [ReactiveFormsModule, RouterLink, MatButtonModule, MatFormFieldModule, MatInputModule, MatProgressBarModule],
  template: `
    <section class="lw-page lw-narrow-page">
      <form class="lw-card lw-form" [formGroup]="form" (ngSubmit)="submit()" aria-labelledby="sign-in-title">
        <h1 id="sign-in-title">Sign in</h1>
        <p class="lead">The calculator works without an account; the team catalog and API tokens need one.</p>
        <mat-form-field appearance="outline">
          <mat-label>E-mail</mat-label>
          <input matInput type="email" formControlName="email" autocomplete="username" required />
          <mat-error>{{ errorText(form.controls.email) }}</mat-error>
        </mat-form-field>
        <mat-form-field appearance="outline">
          <mat-label>Password</mat-label>
          <input matInput type="password" formControlName="password" autocomplete="current-password" required />
          <mat-error>{{ errorText(form.controls.password) }}</mat-error>
        </mat-form-field>
        @if (problem()) {
          <p class="problem" role="alert">{{ problem() }}</p>
        }
        @if (isBusy()) {
          <mat-progress-bar mode="indeterminate" aria-label="Signing in" />
        }
        <div class="lw-actions">
          <button mat-flat-button type="submit" [disabled]="isBusy()">Sign in</button>
          <a mat-button routerLink="/forgot-password">Forgot the password?</a>
        </div>
      </form>
    </section>
  `,
  styles: `.problem { color: var(--mat-sys-error); margin: 0; }`,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class SignInPage {
  readonly returnUrl = input<string>();
  private readonly session = inject(Session);
  private readonly router = inject(Router);
  protected readonly errorText = errorText;
  protected readonly isBusy = signal(false);
  protected readonly problem = signal('');
  protected readonly form = inject(NonNullableFormBuilder).group({
    email: ['', [Validators.required, Validators.email]],
    password: ['', Validators.required],
  });

  protected async submit(): Promise<void> {
    this.form.markAllAsTouched();
    if (this.form.invalid || this.isBusy()) return;
    this.isBusy.set(true);
    this.problem.set('');
    try {
      const { email, password } = this.form.getRawValue();
      await this.session.signIn(email, password);
      await this.router.navigateByUrl(safeReturn(this.returnUrl()));
    } catch (error) {
      // A refused sign-in is an expected answer: it is shown on the form, not thrown on.
      const problem = toApiProblem(error);
      applyFieldProblems(this.form, problem.errors);
      this.problem.set(problem.message);
    } finally {
      this.isBusy.set(false);
    }
  }
}
