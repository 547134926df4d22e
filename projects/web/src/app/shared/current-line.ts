import { Injectable, signal } from '@angular/core';
import type { LineSpec } from '@linewright/lines';

/** The calculator's latest complete line, so other screens can start from it. */
@Injectable({ providedIn: 'root' })
export class CurrentLine {
  readonly spec = signal<LineSpec | undefined>(undefined);
}
