// pdfkit ships no types; only its document class is touched here (pdf-font-cache.ts, pdf-streams.ts, render-pdf.ts).
declare module 'pdfkit' {
  const PDFDocument: { prototype: object };
  export default PDFDocument;
}
