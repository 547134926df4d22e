import { ChangeDetectionStrategy, Component } from '@angular/core';
import { MatTabsModule } from '@angular/material/tabs';
import { UsersPanel } from './users-panel';
import { InvitationsPanel } from './invitations-panel';
import { CaughtMailPanel } from './caught-mail-panel';

@Component({
  selector: 'lw-admin-page',
  imports: [MatTabsModule, UsersPanel, InvitationsPanel, CaughtMailPanel],
  template: `
    <section class="lw-page">
      <header>
        <h1>Team</h1>
        <p class="lead">Who may use the workspace and with which role. Admins approve and retire catalog entries; engineers write drafts; viewers read and calculate.</p>
      </header>
      <mat-tab-group mat-stretch-tabs="false" animationDuration="0ms">
        <mat-tab label="Members"><ng-template matTabContent><lw-users-panel /></ng-template></mat-tab>
        <mat-tab label="Invitations"><ng-template matTabContent><lw-invitations-panel /></ng-template></mat-tab>
        <mat-tab label="Caught mail"><ng-template matTabContent><lw-caught-mail-panel /></ng-template></mat-tab>
      </mat-tab-group>
    </section>
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class AdminPage {}
