import type { QuoteView } from '@pondwright/shared';
import { useState } from 'react';
import { useRefreshQuote, useStartCheckout } from '../api/quote-queries';
import { isQuoteRequestError, quoteErrorMessage } from '../api/quote-request';
import type { PaymentReturn } from '../lib/location';
import { browser } from '../lib/browser';
import { formatDay, formatMoney, isZeroMoney } from '../lib/format';
import { Alert } from '../ui/alert';
import { Button } from '../ui/button';
import { Spinner } from '../ui/spinner';

/** The deposit after acceptance, or the balance on the final invoice. */
export type PaymentPurpose = 'deposit' | 'balance';

type PaymentPanelProps = {
  view: QuoteView;
  token: string;
  /** What is paid; the deposit unless the link carries the final invoice. */
  purpose?: PaymentPurpose;
  paymentReturn: PaymentReturn;
  /** Back from the provider with `?payment=success`: the page checks every few seconds. */
  confirming: boolean;
  /** Checking ran out of time without word of the payment. */
  waitedOut: boolean;
  onCheckAgain: () => void;
};

type PaymentState = { amount: string; paid: boolean; paidAt: string | null };

function paymentState(view: QuoteView, purpose: PaymentPurpose): PaymentState {
  if (purpose === 'balance') {
    return {
      amount: view.invoice?.balance ?? '0',
      paid: view.invoice?.status === 'paid',
      paidAt: view.invoice?.paidAt ?? null,
    };
  }
  return {
    amount: view.payment?.amount ?? view.acceptance?.deposit ?? '0',
    paid: view.payment?.status === 'paid',
    paidAt: view.payment?.paidAt ?? null,
  };
}

/** Pay (the deposit or the balance), wait for the payment's confirmation, or see it received. */
export function PaymentPanel({
  view,
  token,
  purpose = 'deposit',
  paymentReturn,
  confirming,
  waitedOut,
  onCheckAgain,
}: PaymentPanelProps) {
  const checkout = useStartCheckout(token);
  const refresh = useRefreshQuote(token);
  const [leaving, setLeaving] = useState(false);
  const [error, setError] = useState<string | null>(null);
  const money = (amount: string) => formatMoney(amount, view.currency);
  const { amount, paid, paidAt } = paymentState(view, purpose);
  const balance = purpose === 'balance';

  if (paid && balance) {
    return (
      <Alert tone="reed" title="Paid in full — thank you" role="status">
        <p>
          {paidAt
            ? `We received your payment of ${money(amount)} on ${formatDay(paidAt)}.`
            : `We received your payment of ${money(amount)}.`}{' '}
          Nothing more is due. Keep this page for your records.
        </p>
      </Alert>
    );
  }

  if (paid) {
    return (
      <Alert tone="reed" title="Deposit received" role="status">
        <p>
          Thank you. We received your deposit of {money(amount)}
          {paidAt ? ` on ${formatDay(paidAt)}` : ''}. Keep this page or the PDF for your records.
        </p>
      </Alert>
    );
  }

  if (confirming && !waitedOut) {
    return (
      <Alert
        tone="reed"
        title="Thank you — we’re confirming your payment"
        role="status"
        icon={<Spinner size="sm" />}
      >
        <p>This usually takes a few seconds. You can keep this page open.</p>
      </Alert>
    );
  }

  if (confirming && waitedOut) {
    return (
      <Alert tone="clay" title="Your payment is still being confirmed" role="status">
        <div className="qp-stack" data-gap="xs" data-align="start">
          <p>
            We haven’t heard from the payment provider yet. If you completed the payment, there is
            nothing more to do: it will show here once it’s confirmed, and you won’t be charged
            twice.
          </p>
          <Button size="xs" variant="default" onClick={onCheckAgain}>
            Check again
          </Button>
        </div>
      </Alert>
    );
  }

  if (balance && isZeroMoney(amount)) {
    return <p className="qp-sm">There’s nothing left to pay. Thank you!</p>;
  }

  const pay = () => {
    setError(null);
    checkout.mutate(undefined, {
      onSuccess: ({ url }) => {
        setLeaving(true);
        browser.assign(url);
      },
      onError: (failure) => {
        setError(quoteErrorMessage(failure));
        if (isQuoteRequestError(failure) && failure.code === 'DEPOSIT_ALREADY_PAID') void refresh();
      },
    });
  };

  return (
    <div className="qp-stack" data-gap="sm">
      {paymentReturn === 'cancelled' && (
        <Alert tone="stone" title="Your payment wasn’t completed" role="status">
          <p>
            No money was taken. You can pay the {balance ? 'balance' : 'deposit'} whenever you’re
            ready.
          </p>
        </Alert>
      )}
      <p className="qp-sm">
        {balance
          ? 'You’ll pay on a secure payment page and then come back here.'
          : 'The next step is the deposit. You’ll pay on a secure payment page and then come back here.'}
      </p>
      {error && (
        <Alert tone="red" role="alert" title="We couldn’t start the payment">
          <p>{error}</p>
        </Alert>
      )}
      <div>
        <Button size="md" onClick={pay} loading={checkout.isPending || leaving} fullWidth="phone">
          {balance ? `Pay the balance of ${money(amount)}` : `Pay deposit of ${money(amount)}`}
        </Button>
      </div>
    </div>
  );
}
