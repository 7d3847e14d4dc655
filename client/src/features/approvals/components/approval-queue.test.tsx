import type { ApprovalQueueItem } from '@pondwright/shared';
import { screen, waitFor, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { setAccessToken } from '@/lib/api-client';
import { json, mockApi } from '@/testing/mock-api';
import { renderWithProviders } from '@/testing/render';
import { ApprovalQueue } from './approval-queue';

function buildQueueItem(overrides: Partial<ApprovalQueueItem> = {}): ApprovalQueueItem {
  return {
    estimateId: 'est-1',
    number: 17,
    title: 'Koi pond rebuild',
    customerName: 'Marsh Family',
    versionNumber: 2,
    total: '18450.00',
    grossMarginPct: '18.40',
    reasons: [
      { code: 'margin-below-floor', message: 'Gross margin 18.40 % is below the 25 % floor' },
      { code: 'discount-above-ceiling', message: 'Discount 12 % is above the 10 % ceiling' },
    ],
    finalisedByName: 'Eli Estimator',
    finalisedAt: '2026-11-30T15:00:00Z',
    ...overrides,
  };
}

const estimateHref = (id: string) => `/estimates/${id}`;

describe('ApprovalQueue', () => {
  it('says so when nothing is waiting', async () => {
    setAccessToken('t');
    mockApi({ 'GET /api/approvals': json([]) });

    renderWithProviders(<ApprovalQueue estimateHref={estimateHref} />);

    expect(await screen.findByText('Nothing is waiting for you.')).toBeInTheDocument();
  });

  it('lists each waiting estimate with its reasons and a link to it', async () => {
    setAccessToken('t');
    mockApi({ 'GET /api/approvals': json([buildQueueItem()]) });

    renderWithProviders(<ApprovalQueue estimateHref={estimateHref} />);

    const table = await screen.findByRole('table', { name: 'Estimates waiting for approval' });
    expect(within(table).getByText('Margin below floor')).toBeInTheDocument();
    expect(within(table).getByText('Discount above ceiling')).toBeInTheDocument();
    expect(within(table).getByText('Koi pond rebuild')).toBeInTheDocument();
    expect(within(table).getByText('Marsh Family')).toBeInTheDocument();
    expect(within(table).getByText('v2')).toBeInTheDocument();
    expect(within(table).getByText('$18,450.00')).toBeInTheDocument();
    expect(within(table).getByText('18.40 %')).toBeInTheDocument();
    expect(within(table).getByText('Eli Estimator')).toBeInTheDocument();
    expect(within(table).getByRole('link', { name: '#17' })).toHaveAttribute(
      'href',
      '/estimates/est-1',
    );
  });

  it('approves after confirmation, and the estimate leaves the queue', async () => {
    setAccessToken('t');
    const waiting = buildQueueItem();
    const other = buildQueueItem({ estimateId: 'est-2', number: 18, title: 'Stream refresh' });
    const server = mockApi({
      'GET /api/approvals': [json([waiting, other]), json([other])],
      'POST /api/estimates/est-1/approve': json({}),
    });
    const { user } = renderWithProviders(<ApprovalQueue estimateHref={estimateHref} />);

    await user.click(await screen.findByRole('button', { name: 'Approve #17' }));
    const dialog = await screen.findByRole('dialog', { name: 'Approve this estimate?' });
    await user.click(within(dialog).getByRole('button', { name: 'Approve' }));

    await waitFor(() => expect(screen.queryByText('Koi pond rebuild')).not.toBeInTheDocument());
    expect(screen.getByText('Stream refresh')).toBeInTheDocument();
    expect(server.callsTo('POST /api/estimates/est-1/approve')).toHaveLength(1);
  });

  it('sends back only with a comment, and posts the comment', async () => {
    setAccessToken('t');
    const server = mockApi({
      'GET /api/approvals': [json([buildQueueItem()]), json([])],
      'POST /api/estimates/est-1/send-back': json({}),
    });
    const { user } = renderWithProviders(<ApprovalQueue estimateHref={estimateHref} />);

    await user.click(await screen.findByRole('button', { name: 'Send back #17' }));
    const dialog = await screen.findByRole('dialog', { name: 'Send back for changes' });
    await user.click(within(dialog).getByRole('button', { name: 'Send back' }));

    expect(await within(dialog).findByText('Say what needs to change')).toBeInTheDocument();
    expect(server.callsTo('POST /api/estimates/est-1/send-back')).toHaveLength(0);

    await user.type(
      within(dialog).getByRole('textbox', { name: /What needs to change/ }),
      'Price the rock saw at cost',
    );
    await user.click(within(dialog).getByRole('button', { name: 'Send back' }));

    expect(await screen.findByText('Nothing is waiting for you.')).toBeInTheDocument();
    expect(server.callsTo('POST /api/estimates/est-1/send-back')[0]?.body).toEqual({
      comment: 'Price the rock saw at cost',
    });
  });
});
