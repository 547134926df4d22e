import { ChangeDetectionStrategy, Component, inject, signal } from '@angular/core';
import { NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { RouterLink } from '@angular/router';
import { firstValueFrom } from 'rxjs';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { errorText } from '../core/form-errors';
import { ProblemDisplay } from '../core/problem-display';
import { AccountApi } from './account-api';

@Component({
  selector: 'lw-forgot-password-page',
  imports: [ReactiveFormsModule, RouterLink, MatButtonModule, MatFormFieldModule, MatInputModule, MatProgressBarModule],
  template: `
    <section class="lw-page lw-narrow-page">
      @if (sent()) {
        <div class="lw-card" role="status">
          <h1>Check your mail</h1>
          <p>{{ sent() }}</p>
          <p class="lead">The link works once, for an hour.</p>
          <a mat-button routerLink="/sign-in">Back to sign-in</a>
        </div>
      } @else {
        <form class="lw-card lw-form" [formGroup]="form" (ngSubmit)="submit()" aria-labelledby="forgot-title">
          <h1 id="forgot-title">Reset your password</h1>
          <p class="lead">We e-mail a one-time link to the address of your account.</p>
          <mat-form-field appearance="outline">
            <mat-label>E-mail</mat-label>
            <input matInput type="email" formControlName="email" autocomplete="email" required />
            <mat-error>{{ errorText(form.controls.email) }}</mat-error>
          </mat-form-field>
          @if (isBusy()) { <mat-progress-bar mode="indeterminate" aria-label="Sending" /> }
          <div class="lw-actions">
            <button mat-flat-button type="submit" [disabled]="isBusy()">Send the link</button>
            <a mat-button routerLink="/sign-in">Back to sign-in</a>
          </div>
        </form>
      }
    </section>
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ForgotPasswordPage {
  private readonly api = inject(AccountApi);
  private readonly problems = inject(ProblemDisplay);
  protected readonly errorText = errorText;
  protected readonly isBusy = signal(false);
  protected readonly sent = signal('');
  protected readonly form = inject(NonNullableFormBuilder).group({ email: ['', [Validators.required, Validators.email]] });

  protected async submit(): Promise<void> {
    this.form.markAllAsTouched();
    if (this.form.invalid || this.isBusy()) return;
    this.isBusy.set(true);
    try {
      this.sent.set(await firstValueFrom(this.api.requestReset(this.form.getRawValue().email)));
    } catch (error) {
      this.problems.report(error, this.form);
    } finally {
      this.isBusy.set(false);
    }
  }
}
