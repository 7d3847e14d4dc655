import { screen, waitFor } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { setAccessToken } from '@/lib/api-client';
import { apiError, json, mockApi } from '@/testing/mock-api';
import { renderWithProviders } from '@/testing/render';
import { buildCustomerPage, buildCustomerSummary } from '../testing/build-customer';
import { CustomersTable } from './customers-table';

function listUrls(server: ReturnType<typeof mockApi>): URLSearchParams[] {
  return server.fetch.mock.calls
    .map(([input]) => new URL(String(input), 'http://localhost'))
    .filter((url) => url.pathname === '/api/customers')
    .map((url) => url.searchParams);
}

const href = (id: string) => `/customers/${id}`;

describe('CustomersTable', () => {
  it('shows a page of customers with links to each', async () => {
    setAccessToken('t');
    mockApi({
      'GET /api/customers': json(
        buildCustomerPage([
          buildCustomerSummary({ id: 'a', name: 'Odile Brackenridge', siteCount: 2 }),
          buildCustomerSummary({ id: 'b', name: 'Tobiah Quillfeather', phone: '555-0172' }),
        ]),
      ),
    });
    renderWithProviders(<CustomersTable customerHref={href} />);

    const link = await screen.findByRole('link', { name: 'Tobiah Quillfeather' });
    expect(link).toHaveAttribute('href', '/customers/b');
    expect(screen.getByText('555-0172')).toBeInTheDocument();
    expect(screen.getByText('2 customers')).toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'New customer' })).not.toBeInTheDocument();
  });

  it('searches on the server once typing pauses, and says when nothing matches', async () => {
    setAccessToken('t');
    const server = mockApi({
      'GET /api/customers': (request) =>
        json(buildCustomerPage([buildCustomerSummary({ name: `Result ${request.path}` })])),
    });
    server.set('GET /api/customers', [
      json(buildCustomerPage([buildCustomerSummary()])),
      json(buildCustomerPage([])),
    ]);
    const { user } = renderWithProviders(<CustomersTable customerHref={href} />);
    await screen.findByRole('link', { name: 'Odile Brackenridge' });

    await user.type(screen.getByLabelText('Search customers'), 'fen');

    expect(await screen.findByText('No customers match “fen”.')).toBeInTheDocument();
    const searches = listUrls(server).filter((params) => params.has('q'));
    // Typed quickly: one request for the whole word, not one per key.
    expect(searches.map((params) => params.get('q'))).toEqual(['fen']);
    expect(searches[0]?.get('page')).toBe('1');
  });

  it('asks the server to sort and to turn pages', async () => {
    setAccessToken('t');
    const many = Array.from({ length: 25 }, (_, index) =>
      buildCustomerSummary({ id: String(index), name: `Customer ${index}` }),
    );
    const server = mockApi({
      'GET /api/customers': json(buildCustomerPage(many, { total: 60 })),
    });
    const { user } = renderWithProviders(<CustomersTable customerHref={href} />);
    await screen.findByRole('link', { name: 'Customer 0' });

    await user.click(screen.getByRole('button', { name: 'Sort by Name' }));
    await waitFor(() => expect(listUrls(server).at(-1)?.get('order')).toBe('desc'));
    await user.click(screen.getByRole('button', { name: 'Sort by Added' }));
    await waitFor(() => expect(listUrls(server).at(-1)?.get('sort')).toBe('createdAt'));
    await user.click(screen.getByRole('button', { name: 'Page 3' }));
    await waitFor(() => expect(listUrls(server).at(-1)?.get('page')).toBe('3'));
    expect(listUrls(server).at(-1)?.get('pageSize')).toBe('25');
  });

  it('offers to add the first customer, and shows load failures with a retry', async () => {
    setAccessToken('t');
    const server = mockApi({ 'GET /api/customers': json(buildCustomerPage([])) });
    const first = renderWithProviders(<CustomersTable customerHref={href} onCreate={() => {}} />);
    expect(await screen.findByText(/No customers yet/)).toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'New customer' })).toBeInTheDocument();
    first.unmount();

    server.set('GET /api/customers', apiError(403, 'You do not have access'));
    renderWithProviders(<CustomersTable customerHref={href} />);
    expect(await screen.findByText('Could not load customers')).toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'Try again' })).toBeInTheDocument();
  });
});
