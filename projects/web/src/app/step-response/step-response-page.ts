import { ChangeDetectionStrategy, Component } from '@angular/core';

@Component({
  selector: 'lw-step-response-page',
  template: `<h1>Step response</h1>`,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class StepResponsePage {}
