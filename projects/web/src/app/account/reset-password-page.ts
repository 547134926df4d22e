import { ChangeDetectionStrategy, Component, inject, input, signal } from '@angular/core';
import { NonNullableFormBuilder, ReactiveFormsModule } from '@angular/forms';
import { RouterLink } from '@angular/router';
import { firstValueFrom } from 'rxjs';
import { MatButtonModule } from '@angular/material/button';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { ProblemDisplay } from '../core/problem-display';
import { AccountApi } from './account-api';
import { NewPasswordFields } from './new-password-fields';
import { NEW_PASSWORD_VALIDATORS, samePasswords } from './password-rules';

/** The page the e-mailed reset link opens: `/reset-password?token=…`. */
@Component({
  selector: 'lw-reset-password-page',
  imports: [ReactiveFormsModule, RouterLink, MatButtonModule, MatProgressBarModule, NewPasswordFields],
  template: `
    <section class="lw-page lw-narrow-page">
      @if (!token()) {
        <div class="lw-card" role="alert">
          <h1>This link is incomplete</h1>
          <p>Open the link from the e-mail exactly as it is, or ask for a new one.</p>
          <a mat-button routerLink="/forgot-password">Ask for a new link</a>
        </div>
      } @else if (isDone()) {
        <div class="lw-card" role="status">
          <h1>Your password is set</h1>
          <p>Sign in with the new password. Other sessions of your account have ended.</p>
          <a mat-flat-button routerLink="/sign-in">Sign in</a>
        </div>
      } @else {
        <form class="lw-card lw-form" [formGroup]="form" (ngSubmit)="submit()" aria-labelledby="reset-title">
          <h1 id="reset-title">Choose a new password</h1>
          <lw-new-password-fields [group]="form" />
          @if (linkProblem()) {
            <p class="problem" role="alert">{{ linkProblem() }} <a routerLink="/forgot-password">Ask for a new link.</a></p>
          }
          @if (isBusy()) { <mat-progress-bar mode="indeterminate" aria-label="Saving" /> }
          <div class="lw-actions"><button mat-flat-button type="submit" [disabled]="isBusy()">Set the password</button></div>
        </form>
      }
    </section>
  `,
  styles: `.problem { color: var(--mat-sys-error); margin: 0; }`,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ResetPasswordPage {
  readonly token = input<string>();
  private readonly api = inject(AccountApi);
  private readonly problems = inject(ProblemDisplay);
  protected readonly isBusy = signal(false);
  protected readonly isDone = signal(false);
  protected readonly linkProblem = signal('');
  protected readonly form = inject(NonNullableFormBuilder).group(
    { password: ['', NEW_PASSWORD_VALIDATORS], repeat: [''] },
    { validators: samePasswords },
  );

  protected async submit(): Promise<void> {
    this.form.markAllAsTouched();
    if (this.form.invalid || this.isBusy()) return;
    this.isBusy.set(true);
    this.linkProblem.set('');
    try {
      await firstValueFrom(this.api.confirmReset(this.token()!, this.form.getRawValue().password));
      this.isDone.set(true);
    } catch (error) {
      const problem = this.problems.report(error, this.form, { newPassword: 'password' });
      // The server names the token when the link is used or expired; say so on the page as well.
      if (problem.errorsFor('token').length > 0) this.linkProblem.set(problem.message);
    } finally {
      this.isBusy.set(false);
    }
  }
}
