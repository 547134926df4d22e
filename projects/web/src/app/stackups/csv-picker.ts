import { ChangeDetectionStrategy, Component, input, output } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatIconModule } from '@angular/material/icon';

/** A button that picks one CSV file. */
@Component({
  selector: 'lw-csv-picker',
  imports: [MatButtonModule, MatIconModule],
  template: `
    <input #file type="file" accept=".csv,text/csv" hidden (change)="pick($event)" [attr.aria-label]="label()" [attr.name]="name()" />
    <button mat-stroked-button type="button" (click)="file.click()" [disabled]="disabled()"><mat-icon>upload</mat-icon>{{ label() }}</button>
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class CsvPicker {
  readonly label = input.required<string>();
  readonly name = input('file');
  readonly disabled = input(false);
  readonly picked = output<File>();

  protected pick(event: Event): void {
    const target = event.target as HTMLInputElement;
    const file = target.files?.[0];
    if (file) this.picked.emit(file);
    target.value = '';
  }
}
