import type { MailboxMessage } from '@pondwright/shared';

const URL_IN_TEXT = /https?:\/\/[^\s<>"'`]+/gi;
// A sentence's full stop or a closing bracket after a link in plain text is not part of it.
const TRAILING = /[.,;:!?)\]}>]+$/;

function webAddress(candidate: string | null | undefined): string | null {
  if (!candidate) return null;
  try {
    const url = new URL(candidate.trim());
    return url.protocol === 'http:' || url.protocol === 'https:' ? url.href : null;
  } catch {
    return null;
  }
}

/**
 * Every http(s) link in a message, first those of its HTML (read with DOMParser, which runs no
 * script and loads nothing), then any only in its text; each once, in order of appearance.
 */
export function messageLinks(message: Pick<MailboxMessage, 'text' | 'html'>): string[] {
  const found: string[] = [];
  if (message.html) {
    const doc = new DOMParser().parseFromString(message.html, 'text/html');
    doc.querySelectorAll('a[href]').forEach((anchor) => {
      const address = webAddress(anchor.getAttribute('href'));
      if (address) found.push(address);
    });
  }
  for (const match of message.text.matchAll(URL_IN_TEXT)) {
    const address = webAddress(match[0].replace(TRAILING, ''));
    if (address) found.push(address);
  }
  return [...new Set(found)];
}
