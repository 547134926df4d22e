import { ChangeDetectionStrategy, Component, inject, signal } from '@angular/core';
import { NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { DatePipe } from '@angular/common';
import { MAT_DIALOG_DATA, MatDialogModule } from '@angular/material/dialog';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { firstValueFrom } from 'rxjs';
import { errorText } from '../core/form-errors';
import { ProblemDisplay } from '../core/problem-display';
import { StackupsApi } from './stackups-api';
import type { StackupShare } from './stackup-types';

export interface ShareDialogData {
  stackupId: number;
  name: string;
}

/** Mails the impedance table to the fabricator with a read-only link that expires; shows the link once sent. */
@Component({
  selector: 'lw-share-dialog',
  imports: [ReactiveFormsModule, DatePipe, MatDialogModule, MatButtonModule, MatFormFieldModule, MatInputModule, MatProgressBarModule],
  template: `
    <h2 mat-dialog-title>Share “{{ data.name }}” with the fabricator</h2>
    <mat-dialog-content>
      @if (sent(); as share) {
        <p>Sent to <strong>{{ share.email }}</strong>. The link opens the table, its CSV and PDF read-only until {{ share.expiresAt | date: 'mediumDate' }}:</p>
        <p class="lw-secret" data-share-link>{{ share.link }}</p>
      } @else {
        <form class="lw-form" [formGroup]="form" id="share-form" (ngSubmit)="send()">
          <mat-form-field appearance="outline"><mat-label>Fabricator's e-mail</mat-label><input matInput type="email" formControlName="email" name="email" required /><mat-error>{{ errorText(form.controls.email) }}</mat-error></mat-form-field>
          <mat-form-field appearance="outline"><mat-label>Link works for (days)</mat-label><input matInput type="number" min="1" max="90" formControlName="days" name="days" /><mat-error>{{ errorText(form.controls.days) }}</mat-error></mat-form-field>
          <mat-form-field appearance="outline"><mat-label>Message</mat-label><textarea matInput formControlName="message" name="message" rows="3" maxlength="2000"></textarea></mat-form-field>
        </form>
        @if (isSending()) { <mat-progress-bar mode="indeterminate" aria-label="Sending" /> }
      }
    </mat-dialog-content>
    <mat-dialog-actions align="end">
      <button mat-button type="button" mat-dialog-close>{{ sent() ? 'Done' : 'Cancel' }}</button>
      @if (!sent()) { <button mat-flat-button type="submit" form="share-form" [disabled]="isSending()">Send</button> }
    </mat-dialog-actions>
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ShareDialog {
  protected readonly data = inject<ShareDialogData>(MAT_DIALOG_DATA);
  private readonly api = inject(StackupsApi);
  private readonly problems = inject(ProblemDisplay);
  protected readonly errorText = errorText;
  protected readonly sent = signal<StackupShare | undefined>(undefined);
  protected readonly isSending = signal(false);
  protected readonly form = inject(NonNullableFormBuilder).group({
    email: ['', [Validators.required, Validators.email]],
    days: [14, [Validators.required, Validators.min(1), Validators.max(90)]],
    message: [''],
  });

  protected async send(): Promise<void> {
    this.form.markAllAsTouched();
    if (this.form.invalid || this.isSending()) return;
    this.isSending.set(true);
    try {
      const { email, days, message } = this.form.getRawValue();
      this.sent.set(await firstValueFrom(this.api.share(this.data.stackupId, email.trim(), days, message.trim())));
    } catch (error) {
      this.problems.report(error, this.form);
    } finally {
      this.isSending.set(false);
    }
  }
}
