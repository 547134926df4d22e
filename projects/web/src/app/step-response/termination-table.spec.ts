import { TestBed } from '@angular/core/testing';
import { adviseTermination, type TerminationScheme } from '@linewright/lines';
import { TerminationTable } from './termination-table';

describe('TerminationTable', () => {
  // Rs = 10 Ω into an open 50 Ω line: every scheme applies (Johnson & Graham 1993, terminations).
  const advice = adviseTermination(
    { source: { amplitude: 3.3, resistance: 10, riseTime: 100e-12 }, line: { z0: 50, delay: 1e-9 }, load: 'open' },
    { points: 256 },
  );

  function render(fitted: TerminationScheme = 'none') {
    const fixture = TestBed.createComponent(TerminationTable);
    fixture.componentRef.setInput('advice', advice);
    fixture.componentRef.setInput('fitted', fitted);
    fixture.detectChanges();
    return fixture;
  }

  it('lists none, series, parallel, Thevenin and RC with the series resistor Z0 − Rs in words', () => {
    const element: HTMLElement = render().nativeElement;
    const rows = Array.from(element.querySelectorAll('tbody tr')).map((row) => row.getAttribute('data-scheme'));
    expect(rows).toEqual(['none', 'series', 'parallel', 'thevenin', 'rc']);
    expect(element.querySelector('[data-scheme="series"]')!.textContent).toContain('40 Ω in series with the driver');
  });

  it('emits the scheme whose Fit button is pressed, and shows no button on the fitted row', () => {
    const fixture = render('parallel');
    const fitted: TerminationScheme[] = [];
    fixture.componentInstance.fit.subscribe((scheme) => fitted.push(scheme));
    const element: HTMLElement = fixture.nativeElement;
    expect(element.querySelector('[data-scheme="parallel"] button')).toBeNull();
    (element.querySelector('[data-scheme="series"] button') as HTMLButtonElement).click();
    expect(fitted).toEqual(['series']);
  });

  it('marks a driver stronger than Z0 as not applicable for series, with the reason', () => {
    const strong = adviseTermination(
      { source: { amplitude: 1, resistance: 75, riseTime: 100e-12 }, line: { z0: 50, delay: 1e-9 }, load: { resistance: 1e4 } },
      { points: 256 },
    );
    const fixture = TestBed.createComponent(TerminationTable);
    fixture.componentRef.setInput('advice', strong);
    fixture.detectChanges();
    expect((fixture.nativeElement as HTMLElement).querySelector('[data-scheme="series"]')!.textContent).toContain('Not applicable');
  });
});
