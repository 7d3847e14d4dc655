import { DEFAULT_QUOTE_TERMS } from '@pondwright/shared';
import { screen, waitFor } from '@testing-library/react';
import { beforeEach, describe, expect, it } from 'vitest';
import { setAccessToken } from '@/lib/api-client';
import { apiError, json, mockApi } from '@/testing/mock-api';
import { renderWithProviders } from '@/testing/render';
import { QuoteTermsForm } from './quote-terms-form';

const OWN_TERMS = 'Payment: the balance within 14 days.\n\nWarranty: 2 years on our workmanship.';

const termsBox = () => screen.findByRole('textbox', { name: /^Terms/ });

describe('QuoteTermsForm', () => {
  beforeEach(() => setAccessToken('t'));

  it('saves the owner’s own terms and says that sent quotes keep theirs', async () => {
    const server = mockApi({
      'GET /api/company/quote-terms': [
        json({ terms: DEFAULT_QUOTE_TERMS, isDefault: true }),
        json({ terms: OWN_TERMS, isDefault: false }),
      ],
      'PUT /api/company/quote-terms': json({ terms: OWN_TERMS, isDefault: false }),
    });
    const { user } = renderWithProviders(<QuoteTermsForm />);

    const box = await termsBox();
    expect(box).toHaveValue(DEFAULT_QUOTE_TERMS);
    expect(screen.getByText('Built-in default terms')).toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'Restore the default terms' })).toBeDisabled();

    await user.clear(box);
    await user.click(box);
    await user.paste(`  ${OWN_TERMS}`);
    expect(screen.getByText(`${OWN_TERMS.length + 2} / 4,000 characters`)).toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: 'Save terms' }));

    expect(await screen.findByText('Quote terms saved')).toBeInTheDocument();
    expect(screen.getByText(/Quotes already sent keep theirs/)).toBeInTheDocument();
    expect(server.callsTo('PUT /api/company/quote-terms')[0]?.body).toEqual({ terms: OWN_TERMS });
    expect(box).toHaveValue(OWN_TERMS);
    expect(screen.getByText('Your own terms')).toBeInTheDocument();
  });

  it('counts the characters and refuses more than 4,000 before sending anything', async () => {
    const server = mockApi({
      'GET /api/company/quote-terms': json({ terms: OWN_TERMS, isDefault: false }),
    });
    const { user } = renderWithProviders(<QuoteTermsForm />);

    const box = await termsBox();
    await user.clear(box);
    await user.click(box);
    await user.paste('a'.repeat(4001));

    expect(screen.getByText('4,001 / 4,000 characters')).toBeInTheDocument();
    expect(await screen.findByText('Use at most 4,000 characters')).toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: 'Save terms' }));
    expect(server.callsTo('PUT /api/company/quote-terms')).toHaveLength(0);
  });

  it('restores the default terms into the box, to be saved', async () => {
    const server = mockApi({
      'GET /api/company/quote-terms': [
        json({ terms: OWN_TERMS, isDefault: false }),
        json({ terms: DEFAULT_QUOTE_TERMS, isDefault: true }),
      ],
      'PUT /api/company/quote-terms': json({ terms: DEFAULT_QUOTE_TERMS, isDefault: true }),
    });
    const { user } = renderWithProviders(<QuoteTermsForm />);

    const box = await termsBox();
    await user.click(screen.getByRole('button', { name: 'Restore the default terms' }));
    expect(box).toHaveValue(DEFAULT_QUOTE_TERMS);
    await user.click(screen.getByRole('button', { name: 'Save terms' }));

    expect(await screen.findByText('Default terms restored')).toBeInTheDocument();
    expect(server.callsTo('PUT /api/company/quote-terms')[0]?.body).toEqual({
      terms: DEFAULT_QUOTE_TERMS,
    });
    expect(screen.getByText('Built-in default terms')).toBeInTheDocument();
  });

  it('shows the server’s message on the field', async () => {
    mockApi({
      'GET /api/company/quote-terms': json({ terms: OWN_TERMS, isDefault: false }),
      'PUT /api/company/quote-terms': apiError(400, 'Some fields need attention', [
        { field: 'terms', message: 'Use plain text without control characters' },
      ]),
    });
    const { user } = renderWithProviders(<QuoteTermsForm />);

    await termsBox();
    await user.click(screen.getByRole('button', { name: 'Save terms' }));

    await waitFor(() =>
      expect(screen.getByRole('textbox', { name: /^Terms/ })).toHaveAccessibleDescription(
        expect.stringContaining('Use plain text without control characters'),
      ),
    );
    expect(screen.getByText('Some fields need attention')).toBeInTheDocument();
  });

  it('says when the terms cannot be loaded', async () => {
    mockApi({ 'GET /api/company/quote-terms': apiError(403, 'Only owners can do this.') });
    renderWithProviders(<QuoteTermsForm />);

    expect(await screen.findByText('Could not load the terms')).toBeInTheDocument();
    expect(screen.getByText('Only owners can do this.')).toBeInTheDocument();
  });
});
