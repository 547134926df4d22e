import { ChangeDetectionStrategy, Component, inject, input, signal } from '@angular/core';
import { NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { Router, RouterLink } from '@angular/router';
import { firstValueFrom } from 'rxjs';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { Session } from '../core/session';
import { errorText } from '../core/form-errors';
import { ProblemDisplay } from '../core/problem-display';
import { AccountApi } from './account-api';
import { NewPasswordFields } from './new-password-fields';
import { NEW_PASSWORD_VALIDATORS, samePasswords } from './password-rules';

/** The page the e-mailed invitation opens: `/accept-invitation?token=…`; accepting signs the new member in. */
@Component({
  selector: 'lw-accept-invitation-page',
  imports: [ReactiveFormsModule, RouterLink, MatButtonModule, MatFormFieldModule, MatInputModule, MatProgressBarModule, NewPasswordFields],
  template: `
    <section class="lw-page lw-narrow-page">
      @if (!token()) {
        <div class="lw-card" role="alert">
          <h1>This invitation link is incomplete</h1>
          <p>Open the link from the e-mail exactly as it is, or ask an admin to invite you again.</p>
          <a mat-button routerLink="/calculate">To the calculator</a>
        </div>
      } @else {
        <form class="lw-card lw-form" [formGroup]="form" (ngSubmit)="submit()" aria-labelledby="invite-title">
          <h1 id="invite-title">Join your team on Linewright</h1>
          <p class="lead">Choose the name your colleagues see and a password.</p>
          <mat-form-field appearance="outline">
            <mat-label>Your name</mat-label>
            <input matInput formControlName="name" autocomplete="name" required />
            <mat-error>{{ errorText(form.controls.name) }}</mat-error>
          </mat-form-field>
          <lw-new-password-fields [group]="form" />
          @if (linkProblem()) { <p class="problem" role="alert">{{ linkProblem() }}</p> }
          @if (isBusy()) { <mat-progress-bar mode="indeterminate" aria-label="Creating the account" /> }
          <div class="lw-actions"><button mat-flat-button type="submit" [disabled]="isBusy()">Create my account</button></div>
        </form>
      }
    </section>
  `,
  styles: `.problem { color: var(--mat-sys-error); margin: 0; }`,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class AcceptInvitationPage {
  readonly token = input<string>();
  private readonly api = inject(AccountApi);
  private readonly session = inject(Session);
  private readonly router = inject(Router);
  private readonly problems = inject(ProblemDisplay);
  protected readonly errorText = errorText;
  protected readonly isBusy = signal(false);
  protected readonly linkProblem = signal('');
  protected readonly form = inject(NonNullableFormBuilder).group(
    { name: ['', [Validators.required, Validators.maxLength(120)]], password: ['', NEW_PASSWORD_VALIDATORS], repeat: [''] },
    { validators: samePasswords },
  );

  protected async submit(): Promise<void> {
    this.form.markAllAsTouched();
    if (this.form.invalid || this.isBusy()) return;
    this.isBusy.set(true);
    this.linkProblem.set('');
    try {
      const { name, password } = this.form.getRawValue();
      this.session.adopt(await firstValueFrom(this.api.acceptInvitation(this.token()!, name.trim(), password)));
      await this.router.navigateByUrl('/account');
    } catch (error) {
      const problem = this.problems.report(error, this.form);
      if (problem.errorsFor('token').length > 0 || problem.isConflict) this.linkProblem.set(problem.message);
    } finally {
      this.isBusy.set(false);
    }
  }
}
