import { ChangeDetectionStrategy, Component } from '@angular/core';

@Component({
  selector: 'lw-compare-page',
  template: `<h1>Compare</h1>`,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ComparePage {}
