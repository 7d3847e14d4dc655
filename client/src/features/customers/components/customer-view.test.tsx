import { screen, waitFor, within } from '@testing-library/react';
import { describe, expect, it, vi } from 'vitest';
import { setAccessToken } from '@/lib/api-client';
import { apiError, json, mockApi, noContent } from '@/testing/mock-api';
import { renderWithProviders } from '@/testing/render';
import { buildCustomerDetail, buildSite } from '../testing/build-customer';
import { CustomerView } from './customer-view';

const customer = buildCustomerDetail({ id: 'c1', name: 'Odile Brackenridge' });

describe('CustomerView', () => {
  it('shows details and sites read-only to crew leads', async () => {
    setAccessToken('t');
    mockApi({ 'GET /api/customers/c1': json(customer) });
    renderWithProviders(<CustomerView id="c1" canEdit={false} onDeleted={() => {}} />);

    expect(await screen.findByRole('heading', { name: 'Odile Brackenridge' })).toBeInTheDocument();
    const site = screen.getByRole('article', { name: 'Site Back garden' });
    expect(within(site).getByText('Utilities not located')).toBeInTheDocument();
    expect(within(site).getByText('36 in')).toBeInTheDocument();
    expect(within(site).getByText('Side gate; soft lawn after rain.')).toBeInTheDocument();
    expect(screen.getByLabelText(/^Name/)).toHaveAttribute('readonly');
    expect(screen.queryByRole('button', { name: 'Add site' })).not.toBeInTheDocument();
    expect(screen.queryByRole('button', { name: /Delete customer/ })).not.toBeInTheDocument();
  });

  it('adds a site with numbers as numbers and the utilities caution beside the box', async () => {
    setAccessToken('t');
    const server = mockApi({
      'GET /api/customers/c1': json(customer),
      'POST /api/customers/c1/sites': json(buildSite({ id: 's2' }), 201),
    });
    const { user } = renderWithProviders(<CustomerView id="c1" canEdit onDeleted={() => {}} />);
    await user.click(await screen.findByRole('button', { name: 'Add site' }));
    const dialog = await screen.findByRole('dialog', { name: 'New site' });
    expect(within(dialog).getByText(/Request utility locates before digging/)).toBeInTheDocument();

    await user.type(within(dialog).getByLabelText(/^Address/), '3 Sedge Lane');
    await user.type(within(dialog).getByLabelText('Access width (in)'), '700');
    expect(
      await within(dialog).findByText('Access width must be at most 600 in'),
    ).toBeInTheDocument();
    await user.clear(within(dialog).getByLabelText('Access width (in)'));
    await user.type(within(dialog).getByLabelText('Access width (in)'), '42.5');
    await user.type(within(dialog).getByLabelText('Slope (%)'), '6');
    await user.selectOptions(within(dialog).getByLabelText('Soil'), 'loam');
    await user.selectOptions(within(dialog).getByLabelText('Power available'), 'no');
    await user.click(within(dialog).getByLabelText('Utilities located'));
    await user.click(within(dialog).getByRole('button', { name: 'Add site' }));

    await waitFor(() => expect(server.callsTo('POST /api/customers/c1/sites')).toHaveLength(1));
    expect(server.callsTo('POST /api/customers/c1/sites')[0]?.body).toMatchObject({
      addressLine: '3 Sedge Lane',
      accessWidthIn: 42.5,
      carryDistanceFt: null,
      slopePct: 6,
      soil: 'loam',
      waterAvailable: null,
      powerAvailable: false,
      utilitiesLocated: true,
    });
  });

  it('edits details and removes a site', async () => {
    setAccessToken('t');
    const server = mockApi({
      'GET /api/customers/c1': json(customer),
      'PATCH /api/customers/c1': json({ ...customer, phone: '555-0000' }),
      'DELETE /api/customers/c1/sites/7d0c3c4e-2222-4a5b-9c1d-000000000001': noContent(),
    });
    const { user } = renderWithProviders(<CustomerView id="c1" canEdit onDeleted={() => {}} />);
    const phone = await screen.findByLabelText(/^Phone/);
    await user.clear(phone);
    await user.type(phone, '555-0000');
    await user.click(screen.getByRole('button', { name: 'Save details' }));
    await waitFor(() =>
      expect(server.callsTo('PATCH /api/customers/c1')[0]?.body).toMatchObject({
        phone: '555-0000',
      }),
    );

    await user.click(screen.getByRole('button', { name: 'Remove Back garden' }));
    await user.click(await screen.findByRole('button', { name: 'Remove site' }));
    await waitFor(() =>
      expect(
        server.callsTo('DELETE /api/customers/c1/sites/7d0c3c4e-2222-4a5b-9c1d-000000000001'),
      ).toHaveLength(1),
    );
  });

  it('deletes the customer after confirming', async () => {
    setAccessToken('t');
    mockApi({
      'GET /api/customers/c1': json(customer),
      'DELETE /api/customers/c1': noContent(),
    });
    const onDeleted = vi.fn();
    const { user } = renderWithProviders(<CustomerView id="c1" canEdit onDeleted={onDeleted} />);
    await user.click(await screen.findByRole('button', { name: /Delete customer/ }));
    const dialog = await screen.findByRole('dialog', { name: 'Delete this customer?' });
    await user.click(within(dialog).getByRole('button', { name: 'Delete customer' }));
    await waitFor(() => expect(onDeleted).toHaveBeenCalled());
  });

  it('says when the customer cannot be loaded', async () => {
    setAccessToken('t');
    mockApi({ 'GET /api/customers/c1': apiError(404, 'Customer not found') });
    renderWithProviders(<CustomerView id="c1" canEdit onDeleted={() => {}} />);
    expect(await screen.findByText('Customer not found')).toBeInTheDocument();
  });
});
