import { fontFaces, type FontWeight } from './fontFaces';
import { fontRuns } from './fontRuns';
import { useFace } from './useFace';

type Pdf = PDFKit.PDFDocument;

export interface WriteOptions extends PDFKit.Mixins.TextOptions {
  weight?: FontWeight;
  /** Where the text starts; without them it follows on from the document's position. */
  x?: number;
  y?: number;
}

/**
 * Writes text in any script: each run in the first font that has its glyphs (see `fontRuns`),
 * the runs joined into one paragraph with pdfkit's `continued`, so that lines wrap as one text.
 */
export function writeText(pdf: Pdf, text: string, { weight = 'regular', x, y, ...options }: WriteOptions = {}): Pdf {
  const faces = fontFaces(weight);
  // Composed form: "ó" typed as "o" and a combining accent prints as the font's own "ó".
  const runs = fontRuns(text.normalize('NFC'), faces);
  if (runs.length === 0) runs.push({ face: faces[0]!, text: '' });
  runs.forEach((run, i) => {
    useFace(pdf, run.face);
    const runOptions = { ...options, continued: i < runs.length - 1 ? true : options.continued };
    if (i === 0 && x !== undefined) pdf.text(run.text, x, y, runOptions);
    else pdf.text(run.text, runOptions);
  });
  return pdf;
}
