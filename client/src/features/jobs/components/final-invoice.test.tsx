import { screen, waitFor, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { setAccessToken } from '@/lib/api-client';
import { apiError, json, mockApi } from '@/testing/mock-api';
import { renderWithProviders } from '@/testing/render';
import { buildJob } from '../testing/build-job';
import { buildInvoice } from '../testing/build-job-extras';
import { JobPage } from './job-page';

const completed = buildJob({ status: 'completed', completedOn: '2026-03-06' });
const ID = completed.id;
const routes = {
  job: `GET /api/jobs/${ID}`,
  invoice: `GET /api/jobs/${ID}/invoice`,
  send: `POST /api/jobs/${ID}/invoice`,
};

/** The server's error body carries a stable `code` beside the message. */
const conflict = (code: string, message: string) =>
  json({ statusCode: 409, error: 'Conflict', message, code }, 409);

function renderJob() {
  return renderWithProviders(
    <JobPage
      id={ID}
      access={{ money: true, schedule: true, close: true }}
      logHref={(id, date) => `/jobs/${id}/log/${date}`}
    />,
  );
}

async function openInvoice() {
  const rendered = renderJob();
  await rendered.user.click(await screen.findByRole('tab', { name: 'Final invoice' }));
  return rendered;
}

describe('Final invoice', () => {
  it('waits for the job to be completed', async () => {
    setAccessToken('t');
    const server = mockApi({ [routes.job]: json(buildJob({ status: 'in_progress' })) });
    renderJob();
    expect(await screen.findByRole('tab', { name: 'Photos' })).toBeInTheDocument();
    expect(screen.queryByRole('tab', { name: 'Final invoice' })).toBeNull();
    expect(server.callsTo(routes.invoice)).toHaveLength(0);
  });

  it('sends the first invoice to the homeowner and shows total, deposit and balance', async () => {
    setAccessToken('t');
    const server = mockApi({
      [routes.job]: json(completed),
      [routes.invoice]: apiError(404, 'This job has no invoice yet.'),
      [routes.send]: json(buildInvoice(), 201),
    });
    const { user } = await openInvoice();

    expect(await screen.findByText(/No final invoice yet/)).toHaveTextContent('$1,220.77');
    await user.click(screen.getByRole('button', { name: 'Send the final invoice' }));
    const dialog = await screen.findByRole('dialog', { name: 'Send the final invoice' });
    await user.click(within(dialog).getByRole('button', { name: 'Send the final invoice' }));

    await waitFor(() => expect(server.callsTo(routes.send)).toHaveLength(1));
    expect(server.callsTo(routes.send)[0]?.body).toEqual({});
    await waitFor(() => expect(screen.queryByRole('dialog')).not.toBeInTheDocument());
    expect(screen.getByLabelText('Job total')).toHaveTextContent('$1,220.77');
    expect(screen.getByLabelText('Deposit paid')).toHaveTextContent('$366.23');
    expect(screen.getByLabelText('Balance')).toHaveTextContent('$854.54');
    expect(screen.getByText('Open')).toBeInTheDocument();
    expect(screen.getByText(/Sent to bram@example.com/)).toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'Send again' })).toBeInTheDocument();
  });

  it('says why when the job is not complete on the server, then fetches the job again', async () => {
    setAccessToken('t');
    const server = mockApi({
      [routes.job]: [json(completed), json(buildJob({ status: 'in_progress' }))],
      [routes.invoice]: apiError(404, 'This job has no invoice yet.'),
      [routes.send]: conflict('JOB_NOT_COMPLETE', 'Mark the job completed before invoicing it.'),
    });
    const { user } = await openInvoice();

    await user.click(await screen.findByRole('button', { name: 'Send the final invoice' }));
    const dialog = await screen.findByRole('dialog', { name: 'Send the final invoice' });
    await user.click(within(dialog).getByRole('button', { name: 'Send the final invoice' }));

    const alert = await within(dialog).findByRole('alert');
    expect(alert).toHaveTextContent('The job is not complete yet');
    expect(alert).toHaveTextContent('Mark the job completed before invoicing it.');
    expect(server.callsTo(routes.job)).toHaveLength(1);

    // Once the message is read, the job is fetched again: it is in progress, so no invoice yet.
    await user.click(within(dialog).getByRole('button', { name: 'Cancel' }));
    await waitFor(() => expect(server.callsTo(routes.job)).toHaveLength(2));
    await waitFor(() => expect(screen.queryByRole('tab', { name: 'Final invoice' })).toBeNull());
    expect(screen.getByRole('button', { name: 'Mark complete' })).toBeInTheDocument();
  });

  it('sends again with the last address, and says so when the invoice is already paid', async () => {
    setAccessToken('t');
    const paid = buildInvoice({ status: 'paid', paidAt: '2026-03-11T09:30:00.000Z' });
    const server = mockApi({
      [routes.job]: json(completed),
      [routes.invoice]: [json(buildInvoice()), json(paid)],
      [routes.send]: conflict(
        'INVOICE_PAID',
        'This invoice is paid; there is nothing more to send.',
      ),
    });
    const { user } = await openInvoice();

    await user.click(await screen.findByRole('button', { name: 'Send again' }));
    const dialog = await screen.findByRole('dialog', { name: 'Send the final invoice again' });
    expect(within(dialog).getByLabelText('Homeowner’s e-mail')).toHaveValue('bram@example.com');
    await user.click(within(dialog).getByRole('button', { name: 'Send again' }));

    await waitFor(() => expect(server.callsTo(routes.send)).toHaveLength(1));
    expect(server.callsTo(routes.send)[0]?.body).toEqual({ recipientEmail: 'bram@example.com' });
    const alert = await within(dialog).findByRole('alert');
    expect(alert).toHaveTextContent('The invoice is already paid');
    expect(alert).toHaveTextContent('This invoice is paid; there is nothing more to send.');

    await user.click(within(dialog).getByRole('button', { name: 'Cancel' }));
    expect(await screen.findByText('Paid Mar 11, 2026')).toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'Send again' })).toBeNull();
  });
});
