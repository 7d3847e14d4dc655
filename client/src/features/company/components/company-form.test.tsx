import { screen, waitFor } from '@testing-library/react';
import { describe, expect, it, vi } from 'vitest';
import { setAccessToken } from '@/lib/api-client';
import { buildCompany } from '@/testing/factories';
import { apiError, json, mockApi } from '@/testing/mock-api';
import { renderWithProviders } from '@/testing/render';
import { CompanyForm } from './company-form';

describe('CompanyForm', () => {
  it('saves a new name and default units, then says so', async () => {
    setAccessToken('t');
    const server = mockApi({
      'PATCH /api/company': json(buildCompany({ name: 'Lily Pad Works', unitSystem: 'metric' })),
      'GET /api/company': json(buildCompany({ name: 'Lily Pad Works', unitSystem: 'metric' })),
    });
    const onSaved = vi.fn();
    const { user } = renderWithProviders(
      <CompanyForm company={buildCompany()} onSaved={onSaved} />,
    );

    const name = screen.getByLabelText(/^Company name/);
    await user.clear(name);
    await user.type(name, '  Lily Pad Works ');
    await user.click(screen.getByRole('radio', { name: 'Metric (m, L)' }));
    await user.click(screen.getByRole('button', { name: 'Save' }));

    expect(await screen.findByRole('status')).toHaveTextContent('Saved');
    expect(server.callsTo('PATCH /api/company')[0]?.body).toEqual({
      name: 'Lily Pad Works',
      unitSystem: 'metric',
    });
    expect(onSaved).toHaveBeenCalledWith(expect.objectContaining({ unitSystem: 'metric' }));
    expect(name).toHaveValue('Lily Pad Works');

    await user.type(name, '!');
    expect(screen.queryByRole('status')).not.toBeInTheDocument();
  });

  it('checks the name as it is typed, with the shared schema', async () => {
    const { user } = renderWithProviders(<CompanyForm company={buildCompany()} />);

    const name = screen.getByLabelText(/^Company name/);
    await user.clear(name);
    await user.type(name, 'A');

    expect(await screen.findByText('Use at least 2 characters')).toBeInTheDocument();
  });

  it('shows the server’s message on the field it is about', async () => {
    setAccessToken('t');
    mockApi({
      'PATCH /api/company': apiError(400, 'Some fields need attention', [
        { field: 'name', message: 'Another company already uses this name' },
      ]),
    });
    const onSaved = vi.fn();
    const { user } = renderWithProviders(
      <CompanyForm company={buildCompany()} onSaved={onSaved} />,
    );

    await user.click(screen.getByRole('button', { name: 'Save' }));

    await waitFor(() =>
      expect(screen.getByLabelText(/^Company name/)).toHaveAccessibleDescription(
        expect.stringContaining('Another company already uses this name'),
      ),
    );
    expect(screen.getByText('Some fields need attention')).toBeInTheDocument();
    expect(screen.queryByText('Saved')).not.toBeInTheDocument();
    expect(onSaved).not.toHaveBeenCalled();
  });
});
