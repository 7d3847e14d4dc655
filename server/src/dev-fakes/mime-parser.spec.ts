import MailComposer from 'nodemailer/lib/mail-composer';
import { describe, expect, it } from 'vitest';
import { decodeEncodedWords, parseParameterized } from './mime-headers';
import { decodeQuotedPrintable, parseMail, splitMultipart } from './mime-parser';

const pdfBytes = Buffer.concat([Buffer.from('%PDF-1.4\n'), Buffer.alloc(3000, 0xa5)]);

function compose(options: ConstructorParameters<typeof MailComposer>[0]): Promise<Buffer> {
  return new MailComposer(options).compile().build();
}

describe('parseMail on what nodemailer writes', () => {
  it('reads headers, both bodies and an attachment with a non-ASCII name', async () => {
    const subject = 'Quote № 12 — Façade pond, with a subject long enough to be folded over lines';
    const raw = await compose({
      from: 'Pondwright <no-reply@pondwright.example>',
      to: ['"Doe, Jane" <jane@example.com>', 'ops@example.com'],
      subject,
      text: 'Dear Jane,\nYour quote for the façade pond is ready: 1 250,00 €.\n'.repeat(5),
      html: '<p>Dear Jane,</p><p>Your quote for the <b>façade</b> pond is ready.</p>',
      attachments: [
        { filename: 'Devis № 12.pdf', content: pdfBytes, contentType: 'application/pdf' },
      ],
    });

    const mail = parseMail(raw);

    expect(mail.subject).toBe(subject);
    expect(mail.from).toBe('Pondwright <no-reply@pondwright.example>');
    expect(mail.to).toEqual(['jane@example.com', 'ops@example.com']);
    expect(mail.messageId).toMatch(/^<.+@.+>$/);
    expect(mail.text).toContain('Your quote for the façade pond is ready: 1 250,00 €.');
    expect(mail.html).toBe(
      '<p>Dear Jane,</p><p>Your quote for the <b>façade</b> pond is ready.</p>',
    );
    expect(mail.attachments).toEqual([
      { filename: 'Devis № 12.pdf', contentType: 'application/pdf', size: pdfBytes.length },
    ]);
  });

  it('decodes base64 bodies and plain ASCII single-part mail', async () => {
    const base64 = parseMail(
      await compose({ subject: 'Ünïcode', text: 'Grüße aus dem Teich', textEncoding: 'base64' }),
    );
    expect(base64.text).toBe('Grüße aus dem Teich');
    expect(base64.html).toBeNull();

    const plain = parseMail(await compose({ subject: 'Hello', text: 'Plain text' }));
    expect(plain).toMatchObject({ subject: 'Hello', text: 'Plain text', attachments: [] });
  });

  it('keeps related inline images apart from the HTML body', async () => {
    const mail = parseMail(
      await compose({
        html: '<img src="cid:logo@pw">',
        attachments: [{ filename: 'logo.png', content: Buffer.alloc(10), cid: 'logo@pw' }],
      }),
    );
    expect(mail.html).toBe('<img src="cid:logo@pw">');
    expect(mail.attachments).toEqual([
      { filename: 'logo.png', contentType: 'image/png', size: 10 },
    ]);
  });
});

describe('parseMail on hand-written messages', () => {
  it('handles LF line ends, a preamble, latin-1 quoted-printable and RFC 2231 names', () => {
    const raw = Buffer.concat([
      Buffer.from(
        [
          'Subject: =?ISO-8859-1?Q?Caf=E9?= =?UTF-8?B?IOKAlCBwb25k?=',
          'To: Someone <someone@example.com>',
          'Content-Type: multipart/mixed;',
          ' boundary="b1"',
          '',
          'This is the preamble.',
          '--b1',
          'Content-Type: text/plain; charset=iso-8859-1',
          'Content-Transfer-Encoding: quoted-printable',
          '',
          'Caf=E9 au lait, a very long line that was =',
          'softly broken.',
          '--b1x is not a boundary',
          '--b1',
          'Content-Type: application/octet-stream',
          "Content-Disposition: attachment; filename*0*=utf-8''%C3%A9t%C3%A9;",
          ' filename*1=".txt"',
          'Content-Transfer-Encoding: base64',
          '',
          'AAECAw==',
          '--b1--',
          'The epilogue.',
        ].join('\n'),
        'latin1',
      ),
    ]);

    const mail = parseMail(raw);

    expect(mail.subject).toBe('Café — pond');
    expect(mail.to).toEqual(['someone@example.com']);
    expect(mail.text).toBe(
      'Café au lait, a very long line that was softly broken.\n--b1x is not a boundary',
    );
    expect(mail.attachments).toEqual([
      { filename: 'été.txt', contentType: 'application/octet-stream', size: 4 },
    ]);
  });

  it('keeps the parts it has when the closing boundary is missing', () => {
    const raw = Buffer.from('--z\r\nContent-Type: text/plain\r\n\r\nhello\r\n', 'latin1');
    expect(splitMultipart(raw, 'z').map(String)).toEqual([
      'Content-Type: text/plain\r\n\r\nhello\r\n',
    ]);
  });
});

describe('header helpers', () => {
  it('joins adjacent encoded words, even with a character split between them', () => {
    // "№" is E2 84 96 in UTF-8; here its bytes are split over two words.
    expect(decodeEncodedWords('=?UTF-8?Q?Quote_=E2=84?= =?UTF-8?Q?=96_12?= now')).toBe(
      'Quote № 12 now',
    );
    expect(decodeEncodedWords('plain text')).toBe('plain text');
  });

  it('parses quoted parameters with separators inside', () => {
    expect(parseParameterized('Attachment; filename="a; b \\"c\\".pdf"; size=3')).toEqual({
      value: 'attachment',
      params: { filename: 'a; b "c".pdf', size: '3' },
    });
  });

  it('drops transport-added trailing spaces in quoted-printable', () => {
    expect(decodeQuotedPrintable('a=20  \r\nb=\r\nc').toString('latin1')).toBe('a \r\nbc');
  });
});
