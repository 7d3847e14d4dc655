/** A message's subject and its two bodies; the HTML is built from escaped text only. */
export type MailContent = { subject: string; text: string; html: string };

const escapeHtml = (value: string): string =>
  value.replace(/[&<>"']/g, (char) => `&#${char.charCodeAt(0)};`);

export type MailBlock =
  { kind: 'paragraph'; text: string } | { kind: 'button'; label: string; url: string };

/**
 * One plain layout for every e-mail: paragraphs and at most a few buttons, so the text and HTML bodies
 * always say the same thing and nothing a customer typed can inject markup.
 */
export function composeMail(subject: string, blocks: MailBlock[], footer: string): MailContent {
  const text = [
    ...blocks.map((block) =>
      block.kind === 'paragraph' ? block.text : `${block.label}: ${block.url}`,
    ),
    '—',
    footer,
  ].join('\n\n');
  const body = blocks
    .map((block) =>
      block.kind === 'paragraph'
        ? `<p style="margin:0 0 16px;line-height:1.5">${escapeHtml(block.text).replace(/\n/g, '<br>')}</p>`
        : `<p style="margin:24px 0"><a href="${escapeHtml(block.url)}" style="background:#1f6f5c;color:#fff;padding:12px 20px;border-radius:6px;text-decoration:none;display:inline-block">${escapeHtml(block.label)}</a></p>`,
    )
    .join('\n');
  const html = `<!doctype html><html><body style="font-family:Inter,Arial,sans-serif;color:#1d2a26;max-width:560px;margin:0 auto;padding:24px">
${body}
<p style="margin:32px 0 0;color:#5b6b66;font-size:13px">${escapeHtml(footer)}</p>
</body></html>`;
  return { subject, text, html };
}
