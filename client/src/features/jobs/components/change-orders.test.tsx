import { screen, waitFor, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { setAccessToken } from '@/lib/api-client';
import { apiError, json, mockApi } from '@/testing/mock-api';
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
    expect(within(dialog).getByText('Add a line or take work off')).toBeInTheDocument();

    await user.click(within(dialog).getByRole('button', { name: 'Add a line' }));
    await user.click(within(dialog).getByRole('button', { name: 'Price the change' }));
    expect(await within(dialog).findByText('Describe the line')).toBeInTheDocument();
    expect(within(dialog).getByText('Enter a unit cost such as 12.50')).toBeInTheDocument();
    expect(server.callsTo(routes.create)).toHaveLength(0);

    // Removing the only line leaves nothing to price.
    await user.click(within(dialog).getByRole('button', { name: 'Remove line 1' }));
    await user.click(within(dialog).getByRole('button', { name: 'Price the change' }));
    expect(await within(dialog).findByText('Add a line or take work off')).toBeInTheDocument();

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
      reductions: [],
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

  it('takes work off the job as a credit and shows each line, the net credit and the new total', async () => {
    setAccessToken('t');
    // The liner comes off: 480 sq ft, price 510.00, taxed at 7.25 % = 36.98 (the job's only tax).
    // Excavation 16 h → 10 h: 10 × 30.08 = 300.80 cost, × 1.40 = 421.12 price (was 673.79).
    const credit = buildChangeOrder({
      title: 'No liner, less digging',
      reason: 'The homeowner supplies the liner.',
      lines: [
        {
          change: 'removed',
          description: 'EPDM liner, 45 mil',
          quantity: '480',
          unit: 'sq ft',
          fromQuantity: '480',
          toQuantity: '0',
          price: '-510.00',
        },
        {
          change: 'reduced',
          description: 'Excavation',
          quantity: '6',
          unit: 'h',
          fromQuantity: '16',
          toQuantity: '10',
          price: '-252.67',
        },
      ],
      // −510.00 − 252.67 = −762.67 before tax; −36.98 tax; −799.65 in all: 1220.77 → 421.12.
      priceBeforeTax: '-762.67',
      tax: '-36.98',
      total: '-799.65',
      newJobTotal: '421.12',
      // −408.00 − (481.28 − 300.80).
      cost: '-588.48',
    });
    const server = mockApi({
      [routes.job]: json(job),
      [routes.list]: [json([]), json([credit])],
      [routes.create]: [
        apiError(400, 'Enter less than 16 h: a credit takes work off (add new work as a line)', [
          {
            field: 'reductions.1.newQuantity',
            message: 'Enter less than 16 h: a credit takes work off (add new work as a line)',
          },
        ]),
        json(credit, 201),
      ],
    });
    const { user } = await openChanges();

    await user.click(await screen.findByRole('button', { name: 'New change order' }));
    const dialog = await screen.findByRole('dialog', { name: 'New change order' });
    await user.type(within(dialog).getByLabelText(/^Title/), 'No liner, less digging');
    await user.type(within(dialog).getByLabelText(/^Reason/), 'The homeowner supplies the liner.');
    await user.click(within(dialog).getByRole('button', { name: 'Take off work' }));
    await user.click(within(dialog).getByRole('combobox', { name: 'Line of reduction 1' }));
    await user.click(await screen.findByRole('option', { name: 'EPDM liner, 45 mil (480 sq ft)' }));
    expect(within(dialog).getByLabelText('Quantity kept of reduction 1')).toHaveValue('0');
    await user.click(within(dialog).getByRole('button', { name: 'Take off work' }));
    await user.click(within(dialog).getByRole('combobox', { name: 'Line of reduction 2' }));
    // A line already taken off is not offered twice.
    expect(screen.queryByRole('option', { name: 'EPDM liner, 45 mil (480 sq ft)' })).toBeNull();
    await user.click(await screen.findByRole('option', { name: 'Excavation (16 h)' }));
    const kept = within(dialog).getByLabelText('Quantity kept of reduction 2');
    await user.clear(kept);
    await user.type(kept, '16');
    await user.click(within(dialog).getByRole('button', { name: 'Price the change' }));

    // The server says what is wrong with the line, beside it.
    expect(
      await within(dialog).findAllByText(
        'Enter less than 16 h: a credit takes work off (add new work as a line)',
      ),
    ).not.toHaveLength(0);
    expect(kept).toHaveAttribute('aria-invalid', 'true');
    await user.clear(kept);
    await user.type(kept, '10');
    await user.click(within(dialog).getByRole('button', { name: 'Price the change' }));

    await waitFor(() => expect(server.callsTo(routes.create)).toHaveLength(2));
    expect(server.callsTo(routes.create)[1]?.body).toEqual({
      title: 'No liner, less digging',
      reason: 'The homeowner supplies the liner.',
      lines: [],
      reductions: [
        { lineId: 'liner', newQuantity: '0' },
        { lineId: 'labor:excavation', newQuantity: '10' },
      ],
    });

    const priced = await screen.findByRole('dialog', { name: 'The change is priced' });
    const lines = within(priced).getByRole('table', { name: 'Lines of change order 1' });
    const rows = within(lines)
      .getAllByRole('row')
      .slice(1)
      .map((row) => [...row.querySelectorAll('td')].map((cell) => cell.textContent));
    expect(rows).toEqual([
      ['EPDM liner, 45 mil', 'Removed', '480 → 0 sq ft', '-$510.00'],
      ['Excavation', 'Reduced', '16 → 10 h', '-$252.67'],
    ]);
    expect(within(priced).getByLabelText('Before tax')).toHaveTextContent('-$762.67');
    expect(within(priced).getByLabelText('Tax')).toHaveTextContent('-$36.98');
    expect(within(priced).getByLabelText('Credit to the homeowner')).toHaveTextContent('-$799.65');
    expect(within(priced).getByLabelText('Cost change')).toHaveTextContent('-$588.48');
    expect(within(priced).queryByLabelText('The change adds')).toBeNull();
    expect(within(priced).getByLabelText('Job total')).toHaveTextContent(
      'Job total $1,220.77 → $421.12',
    );

    await user.click(within(priced).getByRole('button', { name: 'Send later' }));
    const list = await screen.findByRole('table', { name: 'Change orders' });
    const row = within(list).getByText('No liner, less digging').closest('tr')!;
    expect(within(row).getByText('-$799.65')).toBeInTheDocument();
    expect(within(row).getByText('Credit')).toBeInTheDocument();
    expect(within(row).getByText('$1,220.77 → $421.12')).toBeInTheDocument();
    expect(
      within(row).getByText('EPDM liner, 45 mil (removed) · Excavation (16 → 10 h)'),
    ).toBeInTheDocument();
  });

  it('shows why a credit is refused when it goes below what the homeowner has paid', async () => {
    setAccessToken('t');
    const message =
      "This credit would bring the job's total to $121.12, below the $366.23 the homeowner has already paid. Take off at most $854.54, tax included.";
    mockApi({
      [routes.job]: json(job),
      [routes.list]: json([]),
      [routes.create]: json(
        { statusCode: 409, error: 'Conflict', message, code: 'CREDIT_EXCEEDS_PAID' },
        409,
      ),
    });
    const { user } = await openChanges();

    await user.click(await screen.findByRole('button', { name: 'New change order' }));
    const dialog = await screen.findByRole('dialog', { name: 'New change order' });
    await user.type(within(dialog).getByLabelText(/^Title/), 'Cancel everything');
    await user.click(within(dialog).getByRole('button', { name: 'Take off work' }));
    await user.click(within(dialog).getByRole('combobox', { name: 'Line of reduction 1' }));
    await user.click(await screen.findByRole('option', { name: 'EPDM liner, 45 mil (480 sq ft)' }));
    await user.click(within(dialog).getByRole('button', { name: 'Price the change' }));

    const alert = await within(dialog).findByRole('alert');
    expect(alert).toHaveTextContent('The credit is more than the homeowner still owes');
    expect(alert).toHaveTextContent(message);
    expect(screen.queryByRole('dialog', { name: 'The change is priced' })).toBeNull();
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
