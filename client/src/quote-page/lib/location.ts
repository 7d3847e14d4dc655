/** Where the homeowner is: the quote's token from `/q/<token>`, and how a payment came back. */
export type PaymentReturn = 'success' | 'cancelled' | null;

/** The token in `/q/<token>` (a trailing slash allowed); null for any other path. */
export function tokenFromPath(pathname: string): string | null {
  const match = /^\/q\/([^/]+)\/?$/.exec(pathname);
  if (!match) return null;
  try {
    return decodeURIComponent(match[1]!);
  } catch {
    return null;
  }
}

/** `?payment=success` or `?payment=cancelled`, as the payment provider sends the homeowner back. */
export function paymentReturnFrom(search: string): PaymentReturn {
  const value = new URLSearchParams(search).get('payment');
  return value === 'success' || value === 'cancelled' ? value : null;
}
