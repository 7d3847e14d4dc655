// The checkout session the fake payment API creates: the provider's object shape for the fields the app
// reads, built from the form-encoded create request, with the provider's "missing param" style errors.
import { type FormObject, type FormValue, stringAt, valueAt } from './form-body';

export type CheckoutSession = {
  id: string;
  object: 'checkout.session';
  url: string;
  status: 'open' | 'complete';
  payment_status: 'unpaid' | 'paid';
  amount_subtotal: number;
  amount_total: number;
  currency: string;
  metadata: Record<string, string>;
  client_reference_id: string | null;
  customer_email: string | null;
  success_url: string;
  cancel_url: string | null;
  payment_intent: string | null;
  payment_method_types: string[];
  created: number;
  expires_at: number;
  livemode: false;
  mode: 'payment';
};

/** What the checkout page shows; the provider keeps line items off the session object by default. */
export type CheckoutLineItem = {
  name: string;
  description: string | null;
  unitAmount: number;
  quantity: number;
};

/** A bad create request, answered 400 with the provider's error codes. */
export class CheckoutRequestError extends Error {
  constructor(
    message: string,
    readonly param?: string,
    readonly code: 'parameter_missing' | 'parameter_invalid' = 'parameter_invalid',
  ) {
    super(message);
  }
}

const SESSION_LIFETIME_SECONDS = 24 * 60 * 60;

export function createCheckoutSession(
  form: FormObject,
  { id, url, now }: { id: string; url: string; now: number },
): { session: CheckoutSession; lineItems: CheckoutLineItem[] } {
  const mode = required(form, 'mode');
  if (mode !== 'payment') {
    throw new CheckoutRequestError('This fake supports mode=payment only.', 'mode');
  }
  const successUrl = webUrl(required(form, 'success_url'), 'success_url');
  const cancelUrl = stringAt(form, 'cancel_url');
  const rawItems = valueAt(form, 'line_items');
  if (!Array.isArray(rawItems) || rawItems.length === 0) {
    throw new CheckoutRequestError(
      'Missing required param: line_items.',
      'line_items',
      'parameter_missing',
    );
  }
  const currency = required(form, 'line_items', 0, 'price_data', 'currency').toLowerCase();
  assertCurrency(currency);
  const lineItems = rawItems.map((item, index) => lineItemFrom(item, index, currency));
  const total = lineItems.reduce((sum, item) => sum + item.unitAmount * item.quantity, 0);
  const session: CheckoutSession = {
    id,
    object: 'checkout.session',
    url,
    status: 'open',
    payment_status: 'unpaid',
    amount_subtotal: total,
    amount_total: total,
    currency,
    metadata: stringRecord(valueAt(form, 'metadata')),
    client_reference_id: stringAt(form, 'client_reference_id') || null,
    customer_email: stringAt(form, 'customer_email') || null,
    success_url: successUrl,
    cancel_url: cancelUrl ? webUrl(cancelUrl, 'cancel_url') : null,
    payment_intent: null,
    // Older API versions name the list payment_method_types, newer ones allowed_payment_method_types.
    payment_method_types: stringList(
      valueAt(form, 'payment_method_types') ?? valueAt(form, 'allowed_payment_method_types'),
      ['card'],
    ),
    created: now,
    expires_at: now + SESSION_LIFETIME_SECONDS,
    livemode: false,
    mode: 'payment',
  };
  return { session, lineItems };
}

function lineItemFrom(item: FormValue, index: number, currency: string): CheckoutLineItem {
  const at = (...path: string[]) => `line_items[${index}]${path.map((p) => `[${p}]`).join('')}`;
  if (stringAt(item, 'price') !== undefined) {
    throw new CheckoutRequestError(
      'This fake supports price_data only, not price IDs.',
      at('price'),
    );
  }
  const itemCurrency = (stringAt(item, 'price_data', 'currency') ?? '').toLowerCase();
  if (itemCurrency !== currency) {
    throw new CheckoutRequestError(
      'All line items must use the same currency.',
      at('price_data', 'currency'),
    );
  }
  return {
    name: requiredIn(
      item,
      at('price_data', 'product_data', 'name'),
      'price_data',
      'product_data',
      'name',
    ),
    description: stringAt(item, 'price_data', 'product_data', 'description') || null,
    unitAmount: wholeNumber(item, at('price_data', 'unit_amount'), 0, 'price_data', 'unit_amount'),
    quantity: wholeNumber(item, at('quantity'), 1, 'quantity'),
  };
}

function required(form: FormObject, ...path: Array<string | number>): string {
  const param = path.map((p, i) => (i === 0 ? String(p) : `[${p}]`)).join('');
  return requiredIn(form, param, ...path);
}

function requiredIn(value: FormValue, param: string, ...path: Array<string | number>): string {
  const found = stringAt(value, ...path);
  if (!found) {
    throw new CheckoutRequestError(`Missing required param: ${param}.`, param, 'parameter_missing');
  }
  return found;
}

function wholeNumber(value: FormValue, param: string, min: number, ...path: string[]): number {
  const text = requiredIn(value, param, ...path);
  const number = Number(text);
  if (!/^\d+$/.test(text) || !Number.isSafeInteger(number) || number < min) {
    throw new CheckoutRequestError(`Invalid integer: ${text} (at least ${min}).`, param);
  }
  return number;
}

/** The page links to these URLs, so only http(s) ones are taken. */
function webUrl(text: string, param: string): string {
  // The {CHECKOUT_SESSION_ID} placeholder is not URL-safe as written; check the URL without it.
  let protocol = '';
  try {
    protocol = new URL(text.replaceAll('{CHECKOUT_SESSION_ID}', 'x')).protocol;
  } catch {
    // reported below
  }
  if (protocol !== 'http:' && protocol !== 'https:') {
    throw new CheckoutRequestError(`Not a valid URL: ${text}`, param);
  }
  return text;
}

/** A lower-case ISO 4217 code that Intl knows, so the checkout page can format the amount. */
function assertCurrency(currency: string): void {
  try {
    if (!/^[a-z]{3}$/.test(currency)) throw new RangeError(currency);
    new Intl.NumberFormat('en', { style: 'currency', currency });
  } catch {
    throw new CheckoutRequestError(`Invalid currency: ${currency}.`, 'currency');
  }
}

function stringRecord(value: FormValue | undefined): Record<string, string> {
  if (value === undefined || typeof value === 'string' || Array.isArray(value)) return {};
  return Object.fromEntries(
    Object.entries(value).filter(
      (entry): entry is [string, string] => typeof entry[1] === 'string',
    ),
  );
}

function stringList(value: FormValue | undefined, fallback: string[]): string[] {
  if (!Array.isArray(value)) return fallback;
  const strings = value.filter((entry): entry is string => typeof entry === 'string');
  return strings.length > 0 ? strings : fallback;
}
