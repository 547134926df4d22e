/** The note the app, the API and the PDF show beside every result (LineResult itself does not carry it). */
export const ESTIMATE_NOTE =
  'Results are estimates from published closed-form models; confirm them with the fabricator and by measurement.';
