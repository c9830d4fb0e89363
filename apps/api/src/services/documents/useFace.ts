import type { FontFace } from './fontFaces';

type Pdf = PDFKit.PDFDocument;

const registered = new WeakMap<Pdf, Set<string>>();

/** Makes `face` the document's current font, registering it with the document the first time. */
export function useFace(pdf: Pdf, face: FontFace): Pdf {
  let names = registered.get(pdf);
  if (!names) registered.set(pdf, (names = new Set()));
  if (!names.has(face.name)) {
    pdf.registerFont(face.name, face.bytes());
    names.add(face.name);
  }
  return pdf.font(face.name);
}
