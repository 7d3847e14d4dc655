import { screen, waitFor, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { setAccessToken } from '@/lib/api-client';
import { json, mockApi } from '@/testing/mock-api';
import { renderWithProviders } from '@/testing/render';
import { buildJob } from '../testing/build-job';
import { buildChangeOrder } from '../testing/build-job-extras';
import { JobPage } from './job-page';

const job = buildJob({ status: 'in_progress' });
const ID = job.id;
const routes = {
  job: `GET /api/jobs/${ID}`,
  list: `GET /api/jobs/${ID}/change-orders`,
  create: `POST /api/jobs/${ID}/change-orders`,
  send: `POST /api/jobs/${ID}/change-orders/${buildChangeOrder().id}/send`,
};

async function openChanges() {
  const rendered = renderWithProviders(
    <JobPage
      id={ID}
      access={{ money: true, schedule: true, close: true }}
      logHref={(id, date) => `/jobs/${id}/log/${date}`}
    />,
  );
  await rendered.user.click(await screen.findByRole('tab', { name: 'Change orders' }));
  return rendered;
}

describe('Change orders', () => {
  it('checks a new change order, posts its lines with their own ids, then shows it priced', async () => {
    setAccessToken('t');
    const server = mockApi({
      [routes.job]: json(job),
      [routes.list]: [json([]), json([buildChangeOrder()])],
      [routes.create]: json(buildChangeOrder(), 201),
    });
    const { user } = await openChanges();

    expect(await screen.findByText('No change orders yet.')).toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: 'New change order' }));
    const dialog = await screen.findByRole('dialog', { name: 'New change order' });
    await user.click(within(dialog).getByRole('button', { name: 'Price the change' }));

    expect(await within(dialog).findByText('Name the change')).toBeInTheDocument();
    expect(within(dialog).getByText('Describe the line')).toBeInTheDocument();
    expect(within(dialog).getByText('Enter a unit cost such as 12.50')).toBeInTheDocument();
    expect(server.callsTo(routes.create)).toHaveLength(0);

    // Removing the only line leaves nothing to price.
    await user.click(within(dialog).getByRole('button', { name: 'Remove line 1' }));
    await user.click(within(dialog).getByRole('button', { name: 'Price the change' }));
    expect(await within(dialog).findByText('Add at least one line')).toBeInTheDocument();

    await user.click(within(dialog).getByRole('button', { name: 'Add a line' }));
    await user.type(within(dialog).getByLabelText(/^Title/), 'Second waterfall');
    await user.type(within(dialog).getByLabelText(/^Reason/), 'A spillway by the patio');
    await user.type(within(dialog).getByLabelText('Description of line 1'), 'Boulders');
    await user.clear(within(dialog).getByLabelText('Quantity of line 1'));
    await user.type(within(dialog).getByLabelText('Quantity of line 1'), '2');
    await user.clear(within(dialog).getByLabelText('Unit of line 1'));
    await user.type(within(dialog).getByLabelText('Unit of line 1'), 'ton');
    await user.type(within(dialog).getByLabelText('Unit cost of line 1'), '85');
    await user.click(within(dialog).getByRole('checkbox', { name: 'line 1 is taxable' }));
    await user.click(within(dialog).getByRole('button', { name: 'Add a line' }));
    await user.type(within(dialog).getByLabelText('Description of line 2'), 'Extra labor');
    await user.click(within(dialog).getByRole('combobox', { name: 'Category of line 2' }));
    await user.click(await screen.findByRole('option', { name: 'Labor' }));
    await user.clear(within(dialog).getByLabelText('Unit of line 2'));
    await user.type(within(dialog).getByLabelText('Unit of line 2'), 'h');
    await user.type(within(dialog).getByLabelText('Unit cost of line 2'), '30.08');
    await user.click(within(dialog).getByRole('button', { name: 'Price the change' }));

    await waitFor(() => expect(server.callsTo(routes.create)).toHaveLength(1));
    const body = server.callsTo(routes.create)[0]?.body as {
      lines: Array<{ id: string }>;
    };
    expect(body).toEqual({
      title: 'Second waterfall',
      reason: 'A spillway by the patio',
      lines: [
        {
          id: expect.stringMatching(/^[0-9a-f-]{36}$/),
          category: 'materials',
          description: 'Boulders',
          quantity: '2',
          unit: 'ton',
          unitCost: '85',
          taxable: false,
          kind: 'base',
        },
        {
          id: expect.stringMatching(/^[0-9a-f-]{36}$/),
          category: 'labor',
          description: 'Extra labor',
          quantity: '1',
          unit: 'h',
          unitCost: '30.08',
          taxable: true,
          kind: 'base',
        },
      ],
    });
    expect(body.lines[0]?.id).not.toBe(body.lines[1]?.id);

    const priced = await screen.findByRole('dialog', { name: 'The change is priced' });
    expect(within(priced).getByLabelText('The change adds')).toHaveTextContent('$255.00');
    expect(within(priced).getByLabelText('Its cost')).toHaveTextContent('$170.00');
    expect(within(priced).getByLabelText('Job total')).toHaveTextContent(
      'Job total $1,220.77 → $1,475.77',
    );
    await user.click(within(priced).getByRole('button', { name: 'Send later' }));
    const list = await screen.findByRole('table', { name: 'Change orders' });
    expect(within(list).getByText('Second waterfall')).toBeInTheDocument();
    expect(within(list).getByText('Ready to send')).toBeInTheDocument();
  });

  it('sends a change to the homeowner’s address by default, lists it as sent, and sends it again', async () => {
    setAccessToken('t');
    const sent = buildChangeOrder({ status: 'sent', sentTo: 'bram@example.com' });
    const server = mockApi({
      [routes.job]: json(job),
      [routes.list]: [json([buildChangeOrder()]), json([sent])],
      [routes.send]: json(sent),
    });
    const { user } = await openChanges();

    const list = await screen.findByRole('table', { name: 'Change orders' });
    const row = within(list).getByText('Second waterfall').closest('tr')!;
    expect(within(row).getByText('$255.00')).toBeInTheDocument();
    expect(within(row).getByText('$1,220.77 → $1,475.77')).toBeInTheDocument();
    expect(within(row).getByText('$170.00')).toBeInTheDocument();
    await user.click(within(row).getByRole('button', { name: 'Send to homeowner' }));
    const dialog = await screen.findByRole('dialog', {
      name: 'Send change order 1 to the homeowner',
    });
    expect(within(dialog).getByLabelText('Homeowner’s e-mail')).toHaveValue('');
    await user.click(within(dialog).getByRole('button', { name: 'Send to homeowner' }));

    await waitFor(() => expect(server.callsTo(routes.send)).toHaveLength(1));
    expect(server.callsTo(routes.send)[0]?.body).toEqual({});
    await waitFor(() => expect(screen.queryByRole('dialog')).not.toBeInTheDocument());
    const sentRow = within(screen.getByRole('table', { name: 'Change orders' }))
      .getByText('Second waterfall')
      .closest('tr')!;
    expect(within(sentRow).getByText('Sent')).toBeInTheDocument();
    expect(within(sentRow).getByText('Waiting for bram@example.com')).toBeInTheDocument();

    await user.click(within(sentRow).getByRole('button', { name: 'Send again' }));
    const again = await screen.findByRole('dialog', { name: 'Send change order 1 again' });
    const email = within(again).getByLabelText('Homeowner’s e-mail');
    expect(email).toHaveValue('bram@example.com');
    await user.clear(email);
    await user.type(email, 'not-an-address');
    await user.click(within(again).getByRole('button', { name: 'Send again' }));
    expect(await within(again).findByText(/Enter an e-mail address/)).toBeInTheDocument();
    await user.clear(email);
    await user.type(email, 'tess@example.com');
    await user.click(within(again).getByRole('button', { name: 'Send again' }));
    await waitFor(() => expect(server.callsTo(routes.send)).toHaveLength(2));
    expect(server.callsTo(routes.send)[1]?.body).toEqual({ recipientEmail: 'tess@example.com' });
  });

  it('fetches the job again once the homeowner has accepted a change, so the budget has its lines', async () => {
    setAccessToken('t');
    const grown = buildJob({ status: 'in_progress' });
    grown.budget = {
      ...grown.budget!,
      versionNumber: 2,
      lines: [
        ...grown.budget!.lines,
        {
          id: 'co-boulders',
          category: 'materials',
          description: 'Boulders',
          code: null,
          source: 'manual:co-boulders',
          task: null,
          quantity: '2',
          unit: 'ton',
          unitCost: '85.00',
          extendedCost: '170.00',
          price: '255.00',
        },
      ],
    };
    const accepted = buildChangeOrder({
      status: 'accepted',
      sentTo: 'bram@example.com',
      acceptedByName: 'Bram Thistlewood',
      acceptedAt: '2026-03-05T18:00:00.000Z',
    });
    const server = mockApi({
      [routes.job]: [json(job), json(grown)],
      [routes.list]: json([accepted]),
    });
    const { user } = await openChanges();

    const list = await screen.findByRole('table', { name: 'Change orders' });
    expect(within(list).getByText('Bram Thistlewood, Mar 5, 2026')).toBeInTheDocument();
    expect(within(list).queryByRole('button', { name: /Send/ })).toBeNull();
    await waitFor(() => expect(server.callsTo(routes.job)).toHaveLength(2));

    await user.click(screen.getByRole('tab', { name: 'Budget' }));
    const materials = await screen.findByRole('table', { name: 'Materials budget' });
    expect(within(materials).getByText('Boulders')).toBeInTheDocument();
    // The budget now holds the change's version: the list does not ask for the job a third time.
    expect(server.callsTo(routes.job)).toHaveLength(2);
  });

  it('is not shown to a crew lead', async () => {
    setAccessToken('t');
    const server = mockApi({ [routes.job]: json({ ...job, budget: null }) });
    renderWithProviders(
      <JobPage
        id={ID}
        access={{ money: false, schedule: false, close: false }}
        logHref={(id, date) => `/jobs/${id}/log/${date}`}
      />,
    );
    expect(await screen.findByRole('tab', { name: 'Photos' })).toBeInTheDocument();
    expect(screen.queryByRole('tab', { name: 'Change orders' })).toBeNull();
    expect(server.callsTo(routes.list)).toHaveLength(0);
  });
});
