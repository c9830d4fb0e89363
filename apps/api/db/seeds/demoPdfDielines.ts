// A demo dieline as a printer's artwork program exports it: a PDF with the rules stroked in
// spot colours (separations) named "Cut" and "Crease", written with pdfkit. Invented shape.
import PDFDocument from 'pdfkit';

const PT = 72; // PDF points per inch

/**
 * One up of a soap sleeve: a band of four panels (width, depth, width, depth) and a tapered
 * glue flap, creased at the four folds. Drawn at 1:1 in points.
 */
export function soapSleevePdf(size: { widthIn: number; depthIn: number; heightIn: number }): Promise<Uint8Array> {
  const { widthIn: w, depthIn: d, heightIn: h } = size;
  const glue = 0.5;
  const taper = 0.2;
  const length = glue + 2 * (w + d);
  const folds = [glue, glue + w, glue + w + d, glue + 2 * w + d];
  const doc = new PDFDocument({ size: [(length + 1) * PT, (h + 1) * PT], margin: 0, compress: true });
  const chunks: Buffer[] = [];
  doc.on('data', (c: Buffer) => chunks.push(c));
  const done = new Promise<Uint8Array>((resolve) =>
    doc.on('end', () => resolve(new Uint8Array(Buffer.concat(chunks)))),
  );
  // pdfkit writes a spot colour as a Separation colour space; its type definitions lack the call.
  const spots = doc as typeof doc & { addSpotColor(name: string, c: number, m: number, y: number, k: number): void };
  spots.addSpotColor('Cut', 0, 100, 100, 0);
  spots.addSpotColor('Crease', 100, 0, 0, 0);
  // Artwork and a caption that are not rules: a filled panel and text, left out of the measuring.
  doc.rect((0.5 + glue) * PT, 0.5 * PT + 8, w * PT, 18).fill('#d9e8e4');
  doc
    .fillColor('#333333')
    .fontSize(7)
    .text('Soap sleeve, one up', (0.5 + glue + 0.1) * PT, 0.5 * PT + 12);
  const x = (inches: number) => (0.5 + inches) * PT;
  const y = (inches: number) => (0.5 + inches) * PT;
  doc
    .moveTo(x(0), y(taper))
    .lineTo(x(glue), y(0))
    .lineTo(x(length), y(0))
    .lineTo(x(length), y(h))
    .lineTo(x(glue), y(h))
    .lineTo(x(0), y(h - taper))
    .closePath()
    .lineWidth(0.5)
    .stroke('Cut');
  for (const f of folds) doc.moveTo(x(f), y(0)).lineTo(x(f), y(h)).lineWidth(0.5).stroke('Crease');
  doc.end();
  return done;
}
