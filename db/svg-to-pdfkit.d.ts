// The few parts of svg-to-pdfkit (which ships no types) that the setup-card PDF uses.
declare module "svg-to-pdfkit" {
  interface SvgToPdfOptions {
    /** The viewport in PDF units (with assumePt) into which the SVG is fitted. */
    width?: number;
    height?: number;
    preserveAspectRatio?: string;
    /** Treat one SVG user unit as one PDF point instead of one CSS pixel. */
    assumePt?: boolean;
    useCSS?: boolean;
    precision?: number;
    /** The name of a font registered in the document, for an SVG font-family. */
    fontCallback?: (family: string, bold: boolean, italic: boolean, options: { fauxBold: boolean; fauxItalic: boolean }) => string;
    warningCallback?: (message: string) => void;
  }
  function SVGtoPDF(doc: PDFKit.PDFDocument, svg: string, x?: number, y?: number, options?: SvgToPdfOptions): void;
  export = SVGtoPDF;
}
