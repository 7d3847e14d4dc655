import { render, screen, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { QuoteProviders } from '../quote-providers';
import { buildQuoteView } from '../testing/quote-view';
import { TermsSection } from './quote-sections';

describe('TermsSection', () => {
  it('lists each term as text, keeping the line breaks the company wrote', () => {
    const view = buildQuoteView({
      terms: [
        'Prices are good until 2026-04-01.',
        'Warranty:\n2 years on our workmanship.',
        '<b>Permits</b> are applied for by us.',
      ],
    });
    render(
      <QuoteProviders>
        <TermsSection view={view} />
      </QuoteProviders>,
    );

    const items = within(screen.getByRole('region', { name: 'Terms' })).getAllByRole('listitem');
    expect(items).toHaveLength(3);
    expect(items[1]).toHaveTextContent('Warranty: 2 years on our workmanship.');
    expect(items[1]!.textContent).toContain('Warranty:\n2 years');
    expect(items[1]).toHaveStyle({ whiteSpace: 'pre-line' });
    // Written as text: markup shows as typed, never as HTML.
    expect(items[2]).toHaveTextContent('<b>Permits</b> are applied for by us.');
    expect(items[2]!.querySelector('b')).toBeNull();
  });
});
