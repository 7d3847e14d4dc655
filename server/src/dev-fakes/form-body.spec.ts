import { describe, expect, it } from 'vitest';
import { parseBracketForm, stringAt } from './form-body';

describe('parseBracketForm', () => {
  it('rebuilds nested objects and arrays from bracketed keys', () => {
    const form = parseBracketForm(
      'mode=payment&line_items[0][quantity]=1&line_items[0][price_data][unit_amount]=5000' +
        '&line_items%5B1%5D%5Bquantity%5D=2&metadata[estimateId]=e%201&payment_method_types[0]=card',
    );
    expect(form).toEqual({
      mode: 'payment',
      line_items: [{ quantity: '1', price_data: { unit_amount: '5000' } }, { quantity: '2' }],
      metadata: { estimateId: 'e 1' },
      payment_method_types: ['card'],
    });
    expect(stringAt(form, 'line_items', 0, 'price_data', 'unit_amount')).toBe('5000');
    expect(stringAt(form, 'line_items', 5, 'quantity')).toBeUndefined();
  });

  it('appends for empty brackets and ignores prototype keys', () => {
    const form = parseBracketForm('tags[]=a&tags[]=b&__proto__[polluted]=1&a[constructor][x]=1');
    expect(form).toEqual({ tags: ['a', 'b'] });
    expect(({} as Record<string, unknown>)['polluted']).toBeUndefined();
  });
});
