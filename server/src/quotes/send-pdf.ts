import type { Response } from 'express';

/** Sends a PDF as a download that no cache keeps (it carries a customer's name and prices). */
export function sendPdf(response: Response, pdf: { filename: string; bytes: Buffer }): void {
  response
    .status(200)
    .type('application/pdf')
    .setHeader('Content-Disposition', `attachment; filename="${pdf.filename}"`)
    .setHeader('Cache-Control', 'no-store')
    .send(pdf.bytes);
}
