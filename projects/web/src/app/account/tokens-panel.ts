import { ChangeDetectionStrategy, Component, computed, inject, input, signal, viewChild } from '@angular/core';
import { DatePipe } from '@angular/common';
import { FormGroupDirective, NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { Clipboard } from '@angular/cdk/clipboard';
import { rxResource } from '@angular/core/rxjs-interop';
import { firstValueFrom } from 'rxjs';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatInputModule } from '@angular/material/input';
import { MatProgressSpinnerModule } from '@angular/material/progress-spinner';
import { MatSelectModule } from '@angular/material/select';
import { MatTableModule } from '@angular/material/table';
import type { Role } from '../core/auth-api';
import { toApiProblem } from '../core/api-problem';
import { errorText } from '../core/form-errors';
import { ProblemDisplay } from '../core/problem-display';
import { AccountApi, type ApiToken, type CreatedToken, type TokenScope } from './account-api';

/** Personal API tokens: create (the secret shown once, with a copy button), list with last use, revoke. */
@Component({
  selector: 'lw-tokens-panel',
  imports: [DatePipe, ReactiveFormsModule, MatButtonModule, MatFormFieldModule, MatIconModule, MatInputModule, MatProgressSpinnerModule, MatSelectModule, MatTableModule],
  template: `
    <div class="lw-card">
      <h2 id="tokens-title">API tokens</h2>
      <p class="lead">For scripts: send <code>Authorization: Bearer lwt_…</code>. A read token can only read; a read-write token can do what your role allows.</p>
      <form class="lw-form-row create" [formGroup]="form" (ngSubmit)="create()" aria-label="New API token">
        <mat-form-field appearance="outline">
          <mat-label>Token name</mat-label>
          <input matInput formControlName="name" maxlength="80" required />
          <mat-hint>What the script is, e.g. "nightly stackup check".</mat-hint>
          <mat-error>{{ errorText(form.controls.name) }}</mat-error>
        </mat-form-field>
        <mat-form-field appearance="outline">
          <mat-label>Scope</mat-label>
          <mat-select formControlName="scope">
            <mat-option value="read">Read</mat-option>
            <mat-option value="read-write" [disabled]="role() === 'viewer'">Read and write</mat-option>
          </mat-select>
          @if (role() === 'viewer') { <mat-hint>Viewers can create read tokens only.</mat-hint> }
          <mat-error>{{ errorText(form.controls.scope) }}</mat-error>
        </mat-form-field>
        <div class="create-action"><button mat-flat-button type="submit" [disabled]="isCreating()"><mat-icon>key</mat-icon>Create token</button></div>
      </form>

      @if (created(); as fresh) {
        <div class="secret-box" role="status" aria-live="polite">
          <p><strong>Copy the secret of "{{ fresh.token.name }}" now.</strong> It is shown only this once; the server keeps a hash.</p>
          <div class="secret-row">
            <code class="lw-secret" data-secret>{{ fresh.secret }}</code>
            <button mat-stroked-button type="button" (click)="copy(fresh.secret)"><mat-icon>content_copy</mat-icon>{{ isCopied() ? 'Copied' : 'Copy' }}</button>
          </div>
          <button mat-button type="button" (click)="created.set(undefined)">I have saved it</button>
        </div>
      }

      @if (tokens.isLoading() && !tokens.hasValue()) {
        <div class="lw-state"><mat-spinner diameter="28" aria-label="Loading tokens" /></div>
      } @else if (tokens.error()) {
        <div class="lw-state is-error" role="alert">{{ loadProblem() }} <button mat-button type="button" (click)="tokens.reload()">Try again</button></div>
      } @else if (live().length === 0) {
        <div class="lw-state">You have no API tokens yet.</div>
      } @else {
        <div class="lw-table-wrap">
          <table mat-table [dataSource]="live()" aria-labelledby="tokens-title">
            <ng-container matColumnDef="name">
              <th mat-header-cell *matHeaderCellDef>Name</th>
              <td mat-cell *matCellDef="let token">{{ token.name }}</td>
            </ng-container>
            <ng-container matColumnDef="prefix">
              <th mat-header-cell *matHeaderCellDef>Starts with</th>
              <td mat-cell *matCellDef="let token"><code>{{ token.prefix }}…</code></td>
            </ng-container>
            <ng-container matColumnDef="scope">
              <th mat-header-cell *matHeaderCellDef>Scope</th>
              <td mat-cell *matCellDef="let token">{{ token.scope === 'read' ? 'Read' : 'Read and write' }}</td>
            </ng-container>
            <ng-container matColumnDef="lastUsedAt">
              <th mat-header-cell *matHeaderCellDef>Last used</th>
              <td mat-cell *matCellDef="let token">{{ token.lastUsedAt ? (token.lastUsedAt | date: 'medium') : 'Never' }}</td>
            </ng-container>
            <ng-container matColumnDef="createdAt">
              <th mat-header-cell *matHeaderCellDef>Created</th>
              <td mat-cell *matCellDef="let token">{{ token.createdAt | date: 'mediumDate' }}</td>
            </ng-container>
            <ng-container matColumnDef="actions">
              <th mat-header-cell *matHeaderCellDef><span class="lw-visually-hidden">Actions</span></th>
              <td mat-cell *matCellDef="let token">
                <button mat-button type="button" (click)="revoke(token)" [attr.aria-label]="'Revoke ' + token.name"><mat-icon>block</mat-icon>Revoke</button>
              </td>
            </ng-container>
            <tr mat-header-row *matHeaderRowDef="columns"></tr>
            <tr mat-row *matRowDef="let row; columns: columns"></tr>
          </table>
        </div>
      }
    </div>
  `,
  styles: `
    .create { align-items: flex-start; }
    .create-action { flex: 0 0 auto; padding-top: 8px; }
    .secret-box { border: 1px solid var(--mat-sys-primary); border-radius: 12px; padding: 12px 16px; background: var(--mat-sys-primary-container); color: var(--mat-sys-on-primary-container); }
    .secret-box p { margin: 0 0 8px; }
    .secret-row { display: flex; gap: 8px; align-items: center; flex-wrap: wrap; }
    .secret-row code { flex: 1 1 260px; }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class TokensPanel {
  readonly role = input.required<Role>();
  private readonly api = inject(AccountApi);
  private readonly problems = inject(ProblemDisplay);
  private readonly clipboard = inject(Clipboard);
  protected readonly errorText = errorText;
  protected readonly columns = ['name', 'prefix', 'scope', 'lastUsedAt', 'createdAt', 'actions'];
  protected readonly tokens = rxResource({ stream: () => this.api.tokens() });
  protected readonly live = computed(() => (this.tokens.value() ?? []).filter((token) => !token.revokedAt));
  protected readonly loadProblem = computed(() => toApiProblem(this.tokens.error()).message);
  protected readonly created = signal<CreatedToken | undefined>(undefined);
  protected readonly isCreating = signal(false);
  protected readonly isCopied = signal(false);
  /** Resetting through the directive also clears its submitted flag, so the emptied form shows no errors. */
  private readonly formDirective = viewChild.required(FormGroupDirective);
  protected readonly form = inject(NonNullableFormBuilder).group({
    name: ['', [Validators.required, Validators.maxLength(80)]],
    scope: ['read' as TokenScope, Validators.required],
  });

  protected async create(): Promise<void> {
    this.form.markAllAsTouched();
    if (this.form.invalid || this.isCreating()) return;
    this.isCreating.set(true);
    try {
      const { name, scope } = this.form.getRawValue();
      this.created.set(await firstValueFrom(this.api.createToken(name.trim(), scope)));
      this.isCopied.set(false);
      this.formDirective().resetForm({ name: '', scope: 'read' });
      this.tokens.reload();
    } catch (error) {
      this.problems.report(error, this.form);
    } finally {
      this.isCreating.set(false);
    }
  }

  protected copy(secret: string): void {
    this.isCopied.set(this.clipboard.copy(secret));
  }

  protected async revoke(token: ApiToken): Promise<void> {
    try {
      await firstValueFrom(this.api.revokeToken(token.id));
      this.problems.notify(`Revoked "${token.name}"; scripts using it are refused from now on.`);
      this.tokens.reload();
    } catch (error) {
      this.problems.report(error);
    }
  }
}
