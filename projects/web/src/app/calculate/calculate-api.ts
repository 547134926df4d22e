import { HttpClient } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import type { LineResult, LineSpec } from '@linewright/lines';
import type { Observable } from 'rxjs';

export interface CalculateAnswer {
  spec: LineSpec;
  result: LineResult;
  note: string;
}

/** The server's calculation routes, for checks and for handing a spec to scripts. */
@Injectable({ providedIn: 'root' })
export class CalculateApi {
  private readonly http = inject(HttpClient);

  calculate(spec: LineSpec): Observable<CalculateAnswer> {
    return this.http.post<CalculateAnswer>('/api/v1/calculate', { spec });
  }
}
