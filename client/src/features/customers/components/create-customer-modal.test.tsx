import { screen, waitFor } from '@testing-library/react';
import { describe, expect, it, vi } from 'vitest';
import { setAccessToken } from '@/lib/api-client';
import { apiError, json, mockApi } from '@/testing/mock-api';
import { renderWithProviders } from '@/testing/render';
import { buildCustomerDetail } from '../testing/build-customer';
import { CreateCustomerModal } from './create-customer-modal';

describe('CreateCustomerModal', () => {
  it('checks fields with the shared rules, then creates the customer', async () => {
    setAccessToken('t');
    const created = buildCustomerDetail({ name: 'Maren Hobb', sites: [] });
    const server = mockApi({ 'POST /api/customers': json(created, 201) });
    const onCreated = vi.fn();
    const { user } = renderWithProviders(
      <CreateCustomerModal opened onClose={() => {}} onCreated={onCreated} />,
    );

    await user.type(screen.getByLabelText(/^E-mail/), 'maren');
    expect(
      await screen.findByText('Enter a valid e-mail address, or leave it empty'),
    ).toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: 'Add customer' }));
    expect(await screen.findByText('Enter the customer’s name')).toBeInTheDocument();
    expect(server.callsTo('POST /api/customers')).toHaveLength(0);

    await user.type(screen.getByLabelText(/^Name/), '  Maren Hobb ');
    await user.type(screen.getByLabelText(/^E-mail/), '@Example.test');
    await user.type(screen.getByLabelText(/^Phone/), '555-0190');
    await user.click(screen.getByRole('button', { name: 'Add customer' }));

    await waitFor(() => expect(onCreated).toHaveBeenCalledWith(created));
    expect(server.callsTo('POST /api/customers')[0]?.body).toEqual({
      name: 'Maren Hobb',
      email: 'maren@example.test',
      phone: '555-0190',
      notes: '',
    });
  });

  it('puts the server’s field messages on the form', async () => {
    setAccessToken('t');
    mockApi({
      'POST /api/customers': apiError(400, 'Phone must be at most 40 characters', [
        { field: 'phone', message: 'Phone must be at most 40 characters' },
      ]),
    });
    const { user } = renderWithProviders(
      <CreateCustomerModal opened onClose={() => {}} onCreated={() => {}} />,
    );
    await user.type(screen.getByLabelText(/^Name/), 'Bram Thistlewood');
    await user.click(screen.getByRole('button', { name: 'Add customer' }));
    expect(
      (await screen.findAllByText('Phone must be at most 40 characters')).length,
    ).toBeGreaterThan(0);
  });
});
