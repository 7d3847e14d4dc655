import { screen, waitFor, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { setAccessToken } from '@/lib/api-client';
import { json, mockApi } from '@/testing/mock-api';
import { renderWithProviders } from '@/testing/render';
import { useEstimate } from '../api/get-estimate';
import { useEstimateEditor } from '../hooks/use-estimate-editor';
import { buildEstimate, withRevision } from '../testing/build-estimate';
import { EstimateActions } from './estimate-actions';
import { EstimatePanel } from './estimate-panel';
import { EstimateVersions } from './estimate-versions';
import { EstimatesTable } from './estimates-table';

const estimate = buildEstimate();
const ID = estimate.id;

function Builder() {
  const query = useEstimate(ID);
  if (!query.data) return null;
  return <Editor key={query.data.draft.revision} estimate={query.data} />;
}
function Editor({ estimate: view }: { estimate: typeof estimate }) {
  const editor = useEstimateEditor(view);
  return (
    <>
      <EstimateActions editor={editor} />
      <EstimatePanel estimate={view} editor={editor} />
      <EstimateVersions estimateId={view.id} versions={view.versions} />
    </>
  );
}

describe('Estimates', () => {
  it('asks the server for the chosen status', async () => {
    setAccessToken('t');
    const server = mockApi({
      'GET /api/estimates': json({
        items: [
          {
            id: ID,
            number: 7,
            title: 'Koi pond',
            customerName: 'Bram Thistlewood',
            status: 'awaiting_approval',
            total: '10229.06',
            grossMarginPct: '18.00',
            updatedAt: '2026-12-01T10:00:00.000Z',
          },
        ],
        total: 1,
        page: 1,
        pageSize: 25,
      }),
    });
    const { user } = renderWithProviders(<EstimatesTable estimateHref={(id) => `/e/${id}`} />);
    expect(await screen.findByRole('link', { name: 'Koi pond' })).toHaveAttribute(
      'href',
      `/e/${ID}`,
    );
    expect(
      within(screen.getByRole('table', { name: 'Estimates' })).getByText('Awaiting approval'),
    ).toBeInTheDocument();
    expect(screen.getByText('$10,229.06')).toBeInTheDocument();

    await user.click(screen.getByPlaceholderText('Any status'));
    await user.click(await screen.findByRole('option', { name: 'Approved' }));
    await waitFor(() => {
      const last = new URL(String(server.fetch.mock.calls.at(-1)?.[0]), 'http://localhost');
      expect(last.searchParams.get('status')).toBe('approved');
    });
  });

  it('saves with the revision it was edited from and shows the server’s numbers', async () => {
    setAccessToken('t');
    const server = mockApi({
      ['GET /api/estimates/' + ID]: json(estimate),
      [`PUT /api/estimates/${ID}/draft`]: json(withRevision(estimate, 2, '12345.67')),
    });
    const { user } = renderWithProviders(<Builder />);
    await screen.findByText('$10,229.06');
    await user.clear(screen.getByLabelText('Discount %'));
    await user.type(screen.getByLabelText('Discount %'), '5');
    await user.click(screen.getByRole('button', { name: 'Save draft' }));

    expect(await screen.findByText('$12,345.67')).toBeInTheDocument();
    const body = server.callsTo(`PUT /api/estimates/${ID}/draft`)[0]?.body as Record<
      string,
      unknown
    >;
    expect(body.revision).toBe(1);
    expect(body.discountPct).toBe('5');
  });

  it('opens the conflict dialog on a stale save and keeps the edits', async () => {
    setAccessToken('t');
    mockApi({
      ['GET /api/estimates/' + ID]: json(estimate),
      [`PUT /api/estimates/${ID}/draft`]: json(
        {
          statusCode: 409,
          error: 'Conflict',
          code: 'STALE_DRAFT',
          message: 'The draft changed since you opened it',
          details: [{ field: 'discountPct', message: 'Changed from 0 to 10' }],
          current: withRevision(estimate, 3, '9000.00').draft,
        },
        409,
      ),
    });
    const { user } = renderWithProviders(<Builder />);
    await screen.findByText('$10,229.06');
    await user.clear(screen.getByLabelText('Discount %'));
    await user.type(screen.getByLabelText('Discount %'), '7');
    await user.click(screen.getByRole('button', { name: 'Save draft' }));

    const dialog = await screen.findByRole('dialog', { name: 'Someone else saved this draft' });
    expect(within(dialog).getByText('discountPct')).toBeInTheDocument();
    expect(within(dialog).getByText(/Changed from 0 to 10/)).toBeInTheDocument();
    await user.click(within(dialog).getByRole('button', { name: 'Keep editing' }));
    expect(screen.getByLabelText('Discount %')).toHaveValue('7');
    expect(screen.getByText('$10,229.06')).toBeInTheDocument();
  });

  it('finalises, then compares two versions side by side', async () => {
    setAccessToken('t');
    const v1 = {
      versionNumber: 1,
      contentSha256: 'a',
      total: '10229.06',
      grossMarginPct: '28.19',
      finalisedByName: 'Tomas',
      finalisedAt: '2026-12-01T10:00:00.000Z',
    };
    const v2 = { ...v1, versionNumber: 2, contentSha256: 'b', total: '11000.00' };
    const finalised = { ...estimate, status: 'approved' as const, versions: [v1, v2] };
    const server = mockApi({
      ['GET /api/estimates/' + ID]: [json(estimate), json(finalised)],
      [`POST /api/estimates/${ID}/finalise`]: json(finalised, 201),
      [`GET /api/estimates/${ID}/compare`]: json({
        a: v1,
        b: v2,
        lines: [],
        totals: [{ field: 'total', before: '10229.06', after: '11000.00', delta: '770.94' }],
      }),
    });
    const { user } = renderWithProviders(<Builder />);
    await screen.findByText('$10,229.06');
    await user.click(screen.getByRole('button', { name: 'Finalise' }));
    const dialog = await screen.findByRole('dialog', { name: 'Finalise this estimate?' });
    await user.click(within(dialog).getByRole('button', { name: 'Finalise' }));
    expect(server.callsTo(`POST /api/estimates/${ID}/finalise`)[0]?.body).toEqual({ revision: 1 });

    await user.click(await screen.findByRole('checkbox', { name: 'Compare version 1' }));
    await user.click(screen.getByRole('checkbox', { name: 'Compare version 2' }));
    await user.click(screen.getByRole('button', { name: 'Compare' }));
    const totals = await screen.findByRole('table', { name: 'Totals compared' });
    expect(within(totals).getByText('$10,229.06')).toBeInTheDocument();
    expect(within(totals).getByText('$11,000.00')).toBeInTheDocument();
  });
});
