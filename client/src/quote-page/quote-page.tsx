import { quoteSelectionTotals, type QuoteView } from '@pondwright/shared';
import { useCallback, useEffect, useMemo, useState, type ReactNode } from 'react';
import { useQuote } from './api/quote-queries';
import { isQuoteRequestError, quoteErrorMessage } from './api/quote-request';
import {
  AcceptedPanel,
  AcceptForm,
  ChangeAnsweredPanel,
  ChangeOrderSection,
  DeclinedPanel,
  DeclineForm,
  InvoiceSection,
  PaymentPanel,
  QuoteLinkGone,
  QuoteLoadFailed,
  QuoteNotFound,
} from './components/deferred-parts';
import { PriceSection } from './components/price-section';
import {
  DrawingsSection,
  HighlightsSection,
  IncludedSection,
  QuoteFooter,
  QuoteHeader,
  QuoteTitle,
  SafetySection,
  ScopeSection,
  TermsSection,
} from './components/quote-sections';
import { QuoteLoading } from './components/quote-loading';
import { PaymentScheduleSection, StickySummary, type ChosenTotals } from './components/totals';
import { creditAmount, isCredit } from './lib/change-order';
import { formatMoney } from './lib/format';
import { linkKind } from './lib/link-kind';
import { subtractMoney } from './lib/money';
import { PartBoundary } from './ui/deferred';
import { paymentReturnFrom, tokenFromPath, type PaymentReturn } from './lib/location';

const ACCEPT_ID = 'accept-quote';

type QuotePageProps = {
  pathname: string;
  search: string;
  /** How often to check for the deposit after the provider sends the homeowner back, ms. */
  pollMs?: number;
  /** How long to keep checking before offering "Check again", ms. */
  pollForMs?: number;
};

/** `/q/<token>`: the homeowner's quote, from loading to paid. */
export function QuotePage({ pathname, search, pollMs = 2000, pollForMs = 60_000 }: QuotePageProps) {
  const token = tokenFromPath(pathname);
  return (
    // Parts that lead the page wait here, in the loading state, for their code.
    <PartBoundary fallback={<QuoteLoading />}>
      {token ? (
        <QuoteScreen
          token={token}
          paymentReturn={paymentReturnFrom(search)}
          pollMs={pollMs}
          pollForMs={pollForMs}
        />
      ) : (
        <QuoteNotFound />
      )}
    </PartBoundary>
  );
}

/** Back from the payment provider, something is still to be confirmed: the balance or the deposit. */
function awaitingPayment(view: QuoteView | undefined): boolean {
  if (!view) return false;
  switch (linkKind(view)) {
    case 'invoice':
      return view.invoice?.status !== 'paid';
    case 'change':
      return false;
    case 'quote':
      return view.state === 'accepted' && view.payment?.status !== 'paid';
  }
}

function pageTitle(view: QuoteView): string {
  const { estimate, company } = view;
  switch (linkKind(view)) {
    case 'invoice':
      return `Final invoice for quote ${estimate.number} from ${company.name}`;
    case 'change':
      return `Change ${view.changeOrder?.number ?? ''} to quote ${estimate.number} from ${company.name}`;
    case 'quote':
      return `Quote ${estimate.number} from ${company.name}`;
  }
}

type QuoteScreenProps = {
  token: string;
  paymentReturn: PaymentReturn;
  pollMs: number;
  pollForMs: number;
};

function QuoteScreen({ token, paymentReturn, pollMs, pollForMs }: QuoteScreenProps) {
  const confirming = paymentReturn === 'success';
  const [waitedOut, setWaitedOut] = useState(false);
  const [round, setRound] = useState(0);
  useEffect(() => {
    if (!confirming) return;
    const timer = setTimeout(() => setWaitedOut(true), pollForMs);
    return () => clearTimeout(timer);
  }, [confirming, pollForMs, round]);

  const query = useQuote(token, (view) =>
    confirming && !waitedOut && awaitingPayment(view) ? pollMs : false,
  );
  const { refetch } = query;
  const checkAgain = useCallback(() => {
    setWaitedOut(false);
    setRound((n) => n + 1);
    void refetch();
  }, [refetch]);

  const view = query.data;
  useEffect(() => {
    if (view) document.title = pageTitle(view);
  }, [view]);

  if (view) {
    return (
      <QuoteDocument
        view={view}
        token={token}
        paymentReturn={paymentReturn}
        confirming={confirming}
        waitedOut={waitedOut}
        onCheckAgain={checkAgain}
      />
    );
  }
  if (query.isError) {
    if (isQuoteRequestError(query.error, 404)) return <QuoteNotFound />;
    if (isQuoteRequestError(query.error, 410))
      return <QuoteLinkGone message={query.error.message} />;
    return (
      <QuoteLoadFailed message={quoteErrorMessage(query.error)} onRetry={() => void refetch()} />
    );
  }
  return <QuoteLoading />;
}

type QuoteDocumentProps = {
  view: QuoteView;
  token: string;
  paymentReturn: PaymentReturn;
  confirming: boolean;
  waitedOut: boolean;
  onCheckAgain: () => void;
};

/**
 * The quote itself, in its three states: open (choose and accept), accepted, declined. A link may also
 * carry a change order (accept or decline the change) or the final invoice (pay the balance); both
 * come after the quote was accepted and lead the page, with the project's details below.
 */
function QuoteDocument({
  view,
  token,
  paymentReturn,
  confirming,
  waitedOut,
  onCheckAgain,
}: QuoteDocumentProps) {
  const [chosenIds, setChosenIds] = useState<string[]>([]);
  const [answeredHere, setAnsweredHere] = useState(false);
  const kind = linkKind(view);
  const change = kind === 'change' ? view.changeOrder : null;
  const invoice = kind === 'invoice' ? view.invoice : null;
  // Only a quote link chooses options and pays the deposit; a change answers on its own.
  const open = kind === 'quote' && view.state === 'open';
  const changeOpen = change?.state === 'open';
  const acceptedIds = view.acceptance?.optionIds;
  const shownIds = useMemo(
    () => (view.state === 'accepted' ? (acceptedIds ?? []) : chosenIds),
    [view.state, acceptedIds, chosenIds],
  );

  const live = useMemo(
    () =>
      quoteSelectionTotals({
        baseTotal: view.base.total,
        depositPct: view.depositPct,
        options: view.options,
        chosenIds: shownIds,
      }),
    [view, shownIds],
  );
  // Once accepted, the figures recorded with the acceptance are the ones that count.
  const totals: ChosenTotals = view.acceptance
    ? {
        total: view.acceptance.total,
        deposit: view.acceptance.deposit,
        balance: subtractMoney(view.acceptance.total, view.acceptance.deposit),
      }
    : live;

  const toggle = (optionId: string, chosen: boolean) =>
    setChosenIds((ids) =>
      chosen
        ? [...ids.filter((id) => id !== optionId), optionId]
        : ids.filter((id) => id !== optionId),
    );
  const money = (amount: string) => formatMoney(amount, view.currency);
  // An answer given here shows the answered parts next: fetch them now, so the page does not fall
  // back to its loading state for a moment after "Accept" or "Decline".
  useEffect(() => {
    // On failure the panel asks again when it renders.
    if (open || changeOpen) AcceptedPanel.preload().catch(() => undefined);
  }, [open, changeOpen]);

  return (
    <div className="qp-container qp-stack">
      <QuoteHeader view={view} token={token} />
      <main className="qp-stack">
        <QuoteTitle view={view} token={token} kind={kind} />
        {change && (
          <>
            <ChangeOrderSection
              view={view}
              change={change}
              answerHref={changeOpen ? `#${ACCEPT_ID}` : undefined}
            />
            <ChangeAnsweredPanel view={view} change={change} focus={answeredHere} />
          </>
        )}
        {invoice && (
          <InvoiceSection
            view={view}
            invoice={invoice}
            token={token}
            paymentReturn={paymentReturn}
            confirming={confirming}
            waitedOut={waitedOut}
            onCheckAgain={onCheckAgain}
          />
        )}
        {kind === 'quote' && view.state === 'accepted' && (
          <AcceptedPanel
            view={view}
            totals={totals}
            focus={answeredHere}
            payment={
              <PaymentPanel
                view={view}
                token={token}
                paymentReturn={paymentReturn}
                confirming={confirming}
                waitedOut={waitedOut}
                onCheckAgain={onCheckAgain}
              />
            }
          />
        )}
        {kind === 'quote' && view.state === 'declined' && (
          <DeclinedPanel view={view} focus={answeredHere} />
        )}
        <HighlightsSection view={view} />
        <ScopeSection view={view} />
        <IncludedSection view={view} />
        <DrawingsSection view={view} />
        <PriceSection
          view={view}
          chosenIds={shownIds}
          onToggle={open ? toggle : undefined}
          title={change ? 'Project price with this change' : undefined}
        />
        {open && <StickySummary view={view} totals={totals} acceptHref={`#${ACCEPT_ID}`} />}
        {kind === 'quote' && view.state !== 'declined' && (
          <PaymentScheduleSection
            view={view}
            totals={totals}
            depositPaid={view.payment?.status === 'paid'}
          />
        )}
        {/* The final invoice recalls the acceptance read-only; its figures are above. */}
        {invoice && view.acceptance && (
          <AcceptedPanel view={view} totals={totals} focus={false} invoiced />
        )}
        <TermsSection view={view} />
        <SafetySection view={view} />
        {open && (
          <AnswerCard
            title="Accept this quote"
            accept={
              <AcceptForm
                view={view}
                token={token}
                optionIds={live.optionIds}
                summary={
                  <>
                    Your total is <strong>{money(totals.total)}</strong> with the options you
                    ticked. After you accept, you can pay the deposit of{' '}
                    <strong>{money(totals.deposit)}</strong> online.
                  </>
                }
                onAccepted={() => setAnsweredHere(true)}
              />
            }
            decline={
              <DeclineForm view={view} token={token} onDeclined={() => setAnsweredHere(true)} />
            }
          />
        )}
        {change && changeOpen && (
          <AnswerCard
            title="Accept this change"
            accept={
              <AcceptForm
                view={view}
                token={token}
                subject="change"
                optionIds={[]}
                summary={
                  isCredit(change) ? (
                    <>
                      This change is a credit of <strong>{money(creditAmount(change))}</strong>, tax
                      included, and brings your project to{' '}
                      <strong>{money(change.newJobTotal)}</strong>. It comes off the balance due
                      when the work is finished.
                    </>
                  ) : (
                    <>
                      This change adds <strong>{money(change.total)}</strong>, tax included, and
                      brings your project to <strong>{money(change.newJobTotal)}</strong>. There’s
                      nothing to pay now: it’s added to the balance due when the work is finished.
                    </>
                  )
                }
                onAccepted={() => setAnsweredHere(true)}
              />
            }
            decline={
              <DeclineForm
                view={view}
                token={token}
                subject="change"
                onDeclined={() => setAnsweredHere(true)}
              />
            }
          />
        )}
      </main>
      <QuoteFooter view={view} token={token} kind={kind} />
    </div>
  );
}

/** The accept and decline forms, at the foot of the page. */
function AnswerCard({
  title,
  accept,
  decline,
}: {
  title: string;
  accept: ReactNode;
  decline: ReactNode;
}) {
  return (
    <section
      className="qp-card qp-stack"
      data-gap="lg"
      id={ACCEPT_ID}
      aria-labelledby={`${ACCEPT_ID}-title`}
    >
      <div>
        <h2 className="qp-h4 qp-card-title" id={`${ACCEPT_ID}-title`}>
          {title}
        </h2>
        {accept}
      </div>
      <hr className="qp-divider" />
      {decline}
    </section>
  );
}
