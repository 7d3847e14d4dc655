import type { MailboxMessage } from '@pondwright/shared';
import { screen, waitFor, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { setAccessToken } from '@/lib/api-client';
import { json, mockApi, noContent } from '@/testing/mock-api';
import { renderWithProviders } from '@/testing/render';
import { useMailbox } from '../api/get-mailbox';
import { messageLinks } from '../utils/message-links';
import { Mailbox } from './mailbox';

const QUOTE_LINK = 'http://localhost:5173/q/tok_4b1d9e2a7c';

function buildMessage(overrides: Partial<MailboxMessage> = {}): MailboxMessage {
  return {
    id: 'm1',
    receivedAt: '2026-12-03T09:00:00.000Z',
    from: 'Pondwright <no-reply@pondwright.example>',
    to: ['bram@example.test'],
    subject: 'Your pond quote from Example Ponds Co',
    text: `Hello Bram,\n\nYour quote is ready: ${QUOTE_LINK}.\n\nExample Ponds Co`,
    html: `<p>Hello Bram,</p><p><a href="${QUOTE_LINK}">Open your quote</a></p><script>parent.alert(1)</script>`,
    attachments: [{ filename: 'quote-1.pdf', contentType: 'application/pdf', size: 48_213 }],
    ...overrides,
  };
}

const older = buildMessage({
  id: 'm0',
  receivedAt: '2026-12-02T08:00:00.000Z',
  to: ['sam@example.test'],
  subject: 'You are invited to Example Ponds Co',
  text: 'Join the team: http://localhost:5173/accept-invite/abc',
  html: null,
  attachments: [],
});

function MailboxHarness() {
  const mailbox = useMailbox();
  return mailbox.data ? <Mailbox messages={mailbox.data} /> : null;
}

describe('Developer mailbox', () => {
  it('lists the messages newest first and opens one, with its links clickable', async () => {
    setAccessToken('t');
    mockApi({ 'GET /api/dev/mailbox': json([older, buildMessage()]) });
    const { user } = renderWithProviders(<MailboxHarness />);

    const table = await screen.findByRole('table', { name: 'Messages' });
    const rows = within(table).getAllByRole('row').slice(1);
    expect(rows).toHaveLength(2);
    expect(within(rows[0]!).getByText('Your pond quote from Example Ponds Co')).toBeInTheDocument();
    expect(within(rows[0]!).getByText('bram@example.test')).toBeInTheDocument();
    expect(within(rows[0]!).getByText('quote-1.pdf')).toBeInTheDocument();
    expect(within(rows[1]!).getByText('sam@example.test')).toBeInTheDocument();

    await user.click(screen.getByRole('button', { name: 'Your pond quote from Example Ponds Co' }));

    const message = await screen.findByRole('article', {
      name: 'Your pond quote from Example Ponds Co',
    });
    const links = within(message).getByRole('list', { name: 'Links in this message' });
    expect(within(links).getByRole('link', { name: QUOTE_LINK })).toHaveAttribute(
      'href',
      QUOTE_LINK,
    );
    // The HTML link and the same link in the text (with its full stop) are listed once.
    expect(within(links).getAllByRole('link')).toHaveLength(1);
    const frame = within(message).getByTitle('The message as HTML');
    expect(frame.tagName).toBe('IFRAME');
    expect(frame).toHaveAttribute('sandbox', '');
    expect(frame.getAttribute('srcdoc')).toContain('Open your quote');
    expect(within(message).getByText(/quote-1\.pdf · application\/pdf · 48 KB/)).toBeVisible();

    await user.click(within(message).getByRole('tab', { name: 'Plain text' }));
    expect(await within(message).findByText(/Your quote is ready/)).toBeInTheDocument();
  });

  it('empties the mailbox', async () => {
    setAccessToken('t');
    const server = mockApi({
      'GET /api/dev/mailbox': [json([buildMessage()]), json([])],
      'DELETE /api/dev/mailbox': noContent(),
    });
    const { user } = renderWithProviders(<MailboxHarness />);

    await screen.findByText('Your pond quote from Example Ponds Co');
    await user.click(screen.getByRole('button', { name: 'Empty mailbox' }));

    expect(await screen.findByText(/No messages yet/)).toBeInTheDocument();
    expect(server.callsTo('DELETE /api/dev/mailbox')).toHaveLength(1);
    await waitFor(() =>
      expect(screen.getByRole('button', { name: 'Empty mailbox' })).toBeDisabled(),
    );
  });

  it('keeps only web links, from the HTML and the text', () => {
    expect(
      messageLinks({
        html: '<a href="javascript:alert(1)">x</a><a href="https://example.test/a?b=1&amp;c=2">y</a><a href="/relative">z</a>',
        text: 'See (https://example.test/docs), or mailto:someone@example.test.',
      }),
    ).toEqual(['https://example.test/a?b=1&c=2', 'https://example.test/docs']);
  });
});
