import QRCode from 'qrcode';
import type PDFKit from 'pdfkit';

/**
 * Draws a QR code of the text as vector squares (no image), so the same text always gives the
 * same PDF bytes. `size` is the printed width in points, quiet zone of 4 modules included.
 */
export function drawQrCode(
  doc: PDFKit.PDFDocument,
  text: string,
  x: number,
  y: number,
  size: number,
  colour: string,
): void {
  const { modules } = QRCode.create(text, { errorCorrectionLevel: 'M' });
  const count = modules.size + 8;
  const cell = size / count;
  doc.save().rect(x, y, size, size).fill('#ffffff');
  for (let row = 0; row < modules.size; row++) {
    for (let col = 0; col < modules.size; col++) {
      if (modules.get(row, col)) doc.rect(x + (col + 4) * cell, y + (row + 4) * cell, cell, cell);
    }
  }
  doc.fill(colour).restore();
}

/** The dark modules of the QR code of the text, row by row (for tests that read the code back). */
export function qrMatrix(text: string): boolean[][] {
  const { modules } = QRCode.create(text, { errorCorrectionLevel: 'M' });
  return Array.from({ length: modules.size }, (_, r) =>
    Array.from({ length: modules.size }, (_, c) => !!modules.get(r, c)),
  );
}
