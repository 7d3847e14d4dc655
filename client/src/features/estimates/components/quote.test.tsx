import { screen, waitFor, within } from '@testing-library/react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import type { EstimateStatus, EstimateView } from '@pondwright/shared';
import { setAccessToken } from '@/lib/api-client';
import { apiError, json, mockApi } from '@/testing/mock-api';
import { renderWithProviders } from '@/testing/render';
import { useEstimate } from '../api/get-estimate';
import { useEstimateEditor } from '../hooks/use-estimate-editor';
import { buildEstimate, withRevision } from '../testing/build-estimate';
import {
  buildAcceptedQuote,
  buildEmailDelivery,
  buildQuoteLink,
  buildQuoteStatus,
} from '../testing/build-quote';
import { EstimateActions } from './estimate-actions';
import { EstimateEditNotes } from './estimate-edit-notes';
import { EstimateHeaderStatus } from './estimate-header-status';
import { EstimatePanel } from './estimate-panel';
import { EstimateQuotePanel } from './quote-panel';

const base = buildEstimate();
const ID = base.id;
const at = (status: EstimateStatus): EstimateView => ({ ...base, status });

const customer = {
  id: base.customerId,
  name: 'Bram Thistlewood',
  phone: '',
  email: 'bram@example.test',
  siteCount: 0,
  notes: '',
  sites: [],
  createdAt: '2026-11-01T10:00:00.000Z',
  updatedAt: '2026-11-01T10:00:00.000Z',
};

const routes = {
  estimate: `GET /api/estimates/${ID}`,
  quote: `GET /api/estimates/${ID}/quote`,
  customer: `GET /api/customers/${base.customerId}`,
  send: `POST /api/estimates/${ID}/send`,
  revoke: `POST /api/estimates/${ID}/quote-links/link-1/revoke`,
  save: `PUT /api/estimates/${ID}/draft`,
  pdf: `GET /api/estimates/${ID}/quote.pdf`,
  retryEmail: 'POST /api/outbox/mail-1/retry',
};

/** jsdom has no object URLs; the test's stand-ins are removed again after each test. */
const realObjectUrls = { create: URL.createObjectURL, revoke: URL.revokeObjectURL };
function stubObjectUrls(create: (blob: Blob) => string) {
  URL.createObjectURL = create;
  URL.revokeObjectURL = () => {};
}
afterEach(() => {
  URL.createObjectURL = realObjectUrls.create;
  URL.revokeObjectURL = realObjectUrls.revoke;
});

/** The builder's parts, as the estimate page puts them together. */
function Builder() {
  const query = useEstimate(ID);
  if (!query.data) return null;
  return <Editor key={query.data.draft.revision} estimate={query.data} />;
}
function Editor({ estimate }: { estimate: EstimateView }) {
  const editor = useEstimateEditor(estimate);
  return (
    <>
      <EstimateHeaderStatus estimate={estimate} />
      <EstimateActions editor={editor} />
      <EstimateEditNotes estimate={estimate} />
      <EstimateQuotePanel estimate={estimate} />
      <EstimatePanel estimate={estimate} editor={editor} />
    </>
  );
}

describe('Sending the quote', () => {
  it('checks the dialog with the shared rules, then sends what was typed', async () => {
    setAccessToken('t');
    const sent = buildQuoteStatus({
      links: [buildQuoteLink({ recipientEmail: 'bram.t@example.test' })],
    });
    const server = mockApi({
      [routes.estimate]: [json(at('approved')), json(at('sent'))],
      [routes.quote]: [json(buildQuoteStatus()), json(sent)],
      [routes.customer]: json(customer),
      [routes.send]: json(sent, 201),
    });
    const { user } = renderWithProviders(<Builder />);

    expect(await screen.findByText('No link has been sent yet.')).toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: 'Send to homeowner' }));
    const dialog = await screen.findByRole('dialog', { name: 'Send the quote to the homeowner' });
    const email = within(dialog).getByLabelText(/^Homeowner’s e-mail/);
    await waitFor(() => expect(email).toHaveValue('bram@example.test'));
    expect(within(dialog).getByLabelText(/^Link works for/)).toHaveValue('30');
    expect(within(dialog).queryByText('The earlier link stops working')).not.toBeInTheDocument();

    await user.clear(email);
    await user.type(email, 'bram.example.test');
    expect(await within(dialog).findByText('Enter the homeowner’s e-mail address')).toBeVisible();
    const days = within(dialog).getByLabelText(/^Link works for/);
    await user.clear(days);
    await user.type(days, '120');
    expect(await within(dialog).findByText('Give at most 90 days')).toBeVisible();
    await user.click(within(dialog).getByRole('button', { name: 'Send quote' }));
    expect(server.callsTo(routes.send)).toHaveLength(0);

    await user.clear(email);
    await user.type(email, 'bram.t@example.test');
    await user.clear(days);
    await user.type(days, '14');
    await user.type(
      within(dialog).getByLabelText(/^Message/),
      '  Here is the quote we talked about.  ',
    );
    await user.click(within(dialog).getByRole('button', { name: 'Send quote' }));

    expect(await screen.findByText('Quote sent to bram.t@example.test')).toBeInTheDocument();
    expect(server.callsTo(routes.send)[0]?.body).toEqual({
      recipientEmail: 'bram.t@example.test',
      message: 'Here is the quote we talked about.',
      expiresInDays: 14,
    });
    await waitFor(() =>
      expect(screen.queryByRole('dialog', { name: /Send the quote/ })).not.toBeInTheDocument(),
    );
    // The estimate and its quote are asked for again: now sent, with the link in the table.
    expect(await screen.findByRole('button', { name: 'Resend' })).toBeInTheDocument();
    const links = screen.getByRole('table', { name: 'Links sent' });
    expect(within(links).getByText('bram.t@example.test')).toBeInTheDocument();
    expect(within(links).getByText('Active')).toBeInTheDocument();
  });

  it('leaves the message out when none is written, and shows the server’s field errors', async () => {
    setAccessToken('t');
    const server = mockApi({
      [routes.estimate]: json(at('declined')),
      [routes.quote]: json(
        buildQuoteStatus({
          links: [buildQuoteLink({ status: 'used' })],
          declined: { at: '2026-12-05T08:00:00.000Z', reason: 'Too big for our yard' },
        }),
      ),
      [routes.customer]: json({ ...customer, email: '' }),
      [routes.send]: apiError(400, 'Some details need another look', [
        { field: 'recipientEmail', message: 'This address refused our last e-mail' },
      ]),
    });
    const { user } = renderWithProviders(<Builder />);

    expect(await screen.findByText('Their reason: “Too big for our yard”')).toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: 'Send to homeowner' }));
    const dialog = await screen.findByRole('dialog', { name: 'Send the quote to the homeowner' });
    // No e-mail on the customer: the last link's recipient is offered.
    expect(within(dialog).getByLabelText(/^Homeowner’s e-mail/)).toHaveValue('bram@example.test');
    await user.click(within(dialog).getByRole('button', { name: 'Send quote' }));

    await waitFor(() =>
      expect(within(dialog).getByLabelText(/^Homeowner’s e-mail/)).toHaveAccessibleDescription(
        expect.stringContaining('This address refused our last e-mail'),
      ),
    );
    expect(server.callsTo(routes.send)[0]?.body).toEqual({
      recipientEmail: 'bram@example.test',
      expiresInDays: 30,
    });
  });

  it('calls it a resend when a link is out, and says the earlier link stops working', async () => {
    setAccessToken('t');
    mockApi({
      [routes.estimate]: json(at('viewed')),
      [routes.quote]: json(
        buildQuoteStatus({
          links: [buildQuoteLink({ firstViewedAt: '2026-12-03T18:20:00.000Z' })],
        }),
      ),
      [routes.customer]: json(customer),
    });
    const { user } = renderWithProviders(<Builder />);

    await user.click(await screen.findByRole('button', { name: 'Resend' }));
    const dialog = await screen.findByRole('dialog', { name: 'Resend the quote' });
    expect(within(dialog).getByText('The earlier link stops working')).toBeInTheDocument();
    expect(within(dialog).getByRole('button', { name: 'Resend quote' })).toBeInTheDocument();
  });
});

describe('The quote’s links', () => {
  it('revokes a link after asking, and shows it revoked', async () => {
    setAccessToken('t');
    const revoked = buildQuoteStatus({
      links: [buildQuoteLink({ status: 'revoked', revokedAt: '2026-12-03T12:00:00.000Z' })],
    });
    const server = mockApi({
      [routes.estimate]: json(at('sent')),
      [routes.quote]: json(buildQuoteStatus({ links: [buildQuoteLink()] })),
      [routes.customer]: json(customer),
      [routes.revoke]: json(revoked),
    });
    const { user } = renderWithProviders(<Builder />);

    const links = await screen.findByRole('table', { name: 'Links sent' });
    expect(within(links).getByText('Active')).toBeInTheDocument();
    await user.click(
      within(links).getByRole('button', { name: 'Revoke the link sent to bram@example.test' }),
    );
    const dialog = await screen.findByRole('dialog', { name: 'Revoke this link?' });
    expect(server.callsTo(routes.revoke)).toHaveLength(0);
    await user.click(within(dialog).getByRole('button', { name: 'Revoke link' }));

    expect(
      await screen.findByText('The link sent to bram@example.test no longer works.'),
    ).toBeInTheDocument();
    expect(server.callsTo(routes.revoke)).toHaveLength(1);
    expect(server.callsTo(routes.revoke)[0]?.headers.authorization).toBe('Bearer t');
    expect(within(links).getByText('Revoked')).toBeInTheDocument();
    expect(within(links).queryByRole('button', { name: /Revoke/ })).not.toBeInTheDocument();
  });

  it('says whether each quote e-mail has left, is retrying, or gave up', async () => {
    setAccessToken('t');
    mockApi({
      [routes.estimate]: json(at('sent')),
      [routes.quote]: json(
        buildQuoteStatus({
          links: [
            buildQuoteLink({
              email: buildEmailDelivery({
                status: 'pending',
                attempts: 2,
                lastError: 'connect ECONNREFUSED',
                sentAt: null,
              }),
            }),
            buildQuoteLink({
              id: 'link-0',
              status: 'revoked',
              createdAt: '2026-12-02T09:00:00.000Z',
              email: buildEmailDelivery({
                id: 'mail-0',
                status: 'failed',
                attempts: 10,
                lastError: '550 mailbox unavailable',
                sentAt: null,
              }),
            }),
          ],
        }),
      ),
      [routes.customer]: json(customer),
    });
    renderWithProviders(<Builder />);

    const links = await screen.findByRole('table', { name: 'Links sent' });
    expect(within(links).getByText('E-mail retrying (tried 2×)')).toBeInTheDocument();
    expect(within(links).getByText('E-mail not delivered after 10 tries')).toBeInTheDocument();
    expect(within(links).getByText('Last error: 550 mailbox unavailable')).toBeInTheDocument();
    // The link was withdrawn: e-mailing it again would only deliver a dead link.
    expect(within(links).getByText('Check the address, then resend the quote')).toBeInTheDocument();
    expect(within(links).queryByRole('button', { name: /again/ })).not.toBeInTheDocument();
  });

  it('sends a given-up e-mail again and shows it queued', async () => {
    setAccessToken('t');
    const gaveUp = buildEmailDelivery({
      status: 'failed',
      attempts: 10,
      lastError: '421 try again later',
      sentAt: null,
    });
    const queued = buildEmailDelivery({
      status: 'pending',
      attempts: 0,
      lastError: '421 try again later',
      sentAt: null,
      retriedAt: '2026-12-04T08:00:00.000Z',
    });
    const server = mockApi({
      [routes.estimate]: json(at('sent')),
      [routes.quote]: [
        json(buildQuoteStatus({ links: [buildQuoteLink({ email: gaveUp })] })),
        json(buildQuoteStatus({ links: [buildQuoteLink({ email: queued })] })),
      ],
      [routes.customer]: json(customer),
      [routes.retryEmail]: json(queued),
    });
    const { user } = renderWithProviders(<Builder />);

    const links = await screen.findByRole('table', { name: 'Links sent' });
    expect(within(links).getByText('Last error: 421 try again later')).toBeInTheDocument();
    await user.click(
      within(links).getByRole('button', { name: 'Send the e-mail to bram@example.test again' }),
    );

    expect(
      await screen.findByText('The e-mail to bram@example.test is queued to be sent again.'),
    ).toBeInTheDocument();
    expect(server.callsTo(routes.retryEmail)).toHaveLength(1);
    expect(server.callsTo(routes.retryEmail)[0]?.headers.authorization).toBe('Bearer t');
    expect(await within(links).findByText('E-mail queued again')).toBeInTheDocument();
    expect(within(links).queryByRole('button', { name: /again/ })).not.toBeInTheDocument();
    expect(server.callsTo(routes.quote)).toHaveLength(2);
  });

  it('says so when the e-mail cannot be sent again, and shows where it stands', async () => {
    setAccessToken('t');
    const server = mockApi({
      [routes.estimate]: json(at('sent')),
      [routes.quote]: [
        json(
          buildQuoteStatus({
            links: [
              buildQuoteLink({
                email: buildEmailDelivery({
                  status: 'failed',
                  attempts: 10,
                  lastError: '550 mailbox unavailable',
                  sentAt: null,
                }),
              }),
            ],
          }),
        ),
        // Someone else sent it again meanwhile, and it went.
        json(buildQuoteStatus({ links: [buildQuoteLink()] })),
      ],
      [routes.customer]: json(customer),
      [routes.retryEmail]: json(
        {
          statusCode: 409,
          error: 'Conflict',
          code: 'MAIL_NOT_FAILED',
          message: 'This e-mail was delivered; there is nothing to send again.',
        },
        409,
      ),
    });
    const { user } = renderWithProviders(<Builder />);

    const links = await screen.findByRole('table', { name: 'Links sent' });
    await user.click(
      within(links).getByRole('button', { name: 'Send the e-mail to bram@example.test again' }),
    );

    expect(
      await screen.findByText('This e-mail was delivered; there is nothing to send again.'),
    ).toBeInTheDocument();
    expect(screen.getByText('The e-mail was not sent again')).toBeInTheDocument();
    expect(await within(links).findByText(/^E-mail delivered/)).toBeInTheDocument();
    expect(server.callsTo(routes.retryEmail)).toHaveLength(1);
  });

  it('downloads the PDF with the bearer token', async () => {
    setAccessToken('t');
    const createObjectURL = vi.fn(() => 'blob:quote');
    stubObjectUrls(createObjectURL);
    const downloads: string[] = [];
    const click = vi.spyOn(HTMLAnchorElement.prototype, 'click').mockImplementation(function (
      this: HTMLAnchorElement,
    ) {
      downloads.push(`${this.download} ${this.href}`);
    });
    const server = mockApi({
      [routes.estimate]: json(at('approved')),
      [routes.quote]: json(buildQuoteStatus()),
      [routes.customer]: json(customer),
      [routes.pdf]: new Response('%PDF-1.7', {
        headers: {
          'Content-Type': 'application/pdf',
          'Content-Disposition': 'attachment; filename="quote-1-v1.pdf"',
        },
      }),
    });
    const { user } = renderWithProviders(<Builder />);

    await user.click(await screen.findByRole('button', { name: 'Download PDF' }));

    await waitFor(() => expect(click).toHaveBeenCalled());
    expect(createObjectURL).toHaveBeenCalledTimes(1);
    expect(downloads).toEqual(['quote-1-v1.pdf blob:quote']);
    const request = server.callsTo(routes.pdf)[0];
    expect(request?.headers.authorization).toBe('Bearer t');
    expect(request?.headers.accept).toBe('application/pdf');
  });
});

describe('An estimate the homeowner has', () => {
  it('locks an accepted estimate: a note, and no saving, finalising, sending or revoking', async () => {
    setAccessToken('t');
    mockApi({
      [routes.estimate]: json(at('accepted')),
      [routes.quote]: json(buildAcceptedQuote(false)),
      [routes.customer]: json(customer),
    });
    renderWithProviders(<Builder />);

    expect(
      await screen.findByText(
        'Accepted quotes are locked. The accepted version is kept as the homeowner saw it.',
      ),
    ).toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'Save draft' })).toBeDisabled();
    expect(screen.getByRole('button', { name: 'Finalise' })).toBeDisabled();
    expect(screen.getByLabelText('Discount %')).toBeDisabled();
    expect(screen.getByLabelText('Scope of work')).toBeDisabled();
    expect(screen.getByRole('heading', { name: 'Homeowner’s quote' })).toBeInTheDocument();
    expect(screen.queryByRole('button', { name: /Send to homeowner|Resend/ })).toBeNull();
    expect(await screen.findByText('Deposit not paid yet')).toBeInTheDocument();
    expect(screen.queryByRole('button', { name: /Revoke/ })).not.toBeInTheDocument();
  });

  it('shows the acceptance and the deposit paid, also beside the status', async () => {
    setAccessToken('t');
    mockApi({
      [routes.estimate]: json(at('accepted')),
      [routes.quote]: json(buildAcceptedQuote(true)),
      [routes.customer]: json(customer),
    });
    renderWithProviders(<Builder />);

    const acceptance = await screen.findByRole('region', { name: 'Acceptance' });
    expect(within(acceptance).getByText('Accepted by Bram Thistlewood')).toBeInTheDocument();
    expect(within(acceptance).getByText(/Deposit paid \$3,068\.72 on /)).toBeInTheDocument();
    expect(within(acceptance).getByText('$10,229.06')).toBeInTheDocument();
    expect(within(acceptance).getByText(/No options chosen/)).toBeInTheDocument();
    expect(within(acceptance).getByText(/IP 203\.0\.113\.7/)).toBeInTheDocument();
    expect(within(acceptance).getByText('ab12cd34ef56')).toBeInTheDocument();
    expect(within(acceptance).getByText(/Version 1 · SHA-256/)).toBeInTheDocument();
    // Beside "Accepted" at the top of the page.
    expect(screen.getByText('Accepted')).toBeInTheDocument();
    expect(screen.getByText('Deposit paid')).toBeInTheDocument();
  });

  it('warns that saving withdraws the link, and says so again after saving', async () => {
    setAccessToken('t');
    const server = mockApi({
      [routes.estimate]: json(at('sent')),
      [routes.quote]: [json(buildQuoteStatus({ links: [buildQuoteLink()] }))],
      [routes.customer]: json(customer),
      // The server revokes the link and puts the estimate back to draft.
      [routes.save]: json({ ...withRevision(base, 2, '10229.06'), status: 'draft' }),
    });
    const { user } = renderWithProviders(<Builder />);

    expect(
      await screen.findByText(
        /Saving changes to the draft withdraws the link sent to the homeowner/,
      ),
    ).toBeInTheDocument();
    await user.clear(screen.getByLabelText('Discount %'));
    await user.type(screen.getByLabelText('Discount %'), '5');
    await user.click(screen.getByRole('button', { name: 'Save draft' }));

    expect(
      await screen.findByText(/The link sent to the homeowner no longer works/),
    ).toBeInTheDocument();
    expect(server.callsTo(routes.save)).toHaveLength(1);
    await waitFor(() =>
      expect(screen.queryByRole('heading', { name: 'Send to homeowner' })).not.toBeInTheDocument(),
    );
    expect(screen.queryByText(/Saving changes to the draft withdraws/)).not.toBeInTheDocument();
  });

  it('says so when the server refuses a save because the quote was accepted meanwhile', async () => {
    setAccessToken('t');
    const server = mockApi({
      [routes.estimate]: [json(at('viewed')), json(at('accepted'))],
      [routes.quote]: [
        json(buildQuoteStatus({ links: [buildQuoteLink()] })),
        json(buildAcceptedQuote(false)),
      ],
      [routes.customer]: json(customer),
      [routes.save]: json(
        {
          statusCode: 409,
          error: 'Conflict',
          code: 'ESTIMATE_LOCKED',
          message: 'The homeowner accepted this estimate, so it can no longer change.',
        },
        409,
      ),
    });
    const { user } = renderWithProviders(<Builder />);

    await screen.findByText(/Saving changes to the draft withdraws/);
    await user.click(screen.getByRole('button', { name: 'Save draft' }));

    expect(
      await screen.findByText('The homeowner accepted this estimate, so it can no longer change.'),
    ).toBeInTheDocument();
    expect(screen.queryByRole('dialog', { name: 'Someone else saved this draft' })).toBeNull();
    expect(await screen.findByText(/Accepted quotes are locked/)).toBeInTheDocument();
    expect(server.callsTo(routes.estimate).length).toBe(2);
  });
});
