import { Container, Divider, Paper, Stack, Title } from '@mantine/core';
import { quoteSelectionTotals, type QuoteView } from '@pondwright/shared';
import { useCallback, useEffect, useMemo, useState } from 'react';
import { useQuote } from './api/quote-queries';
import { isQuoteRequestError, quoteErrorMessage } from './api/quote-request';
import { AcceptForm } from './components/accept-form';
import { AcceptedPanel, DeclinedPanel } from './components/answer-panels';
import { DeclineForm } from './components/decline-form';
import { PaymentPanel } from './components/payment-panel';
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
import {
  QuoteLinkGone,
  QuoteLoadFailed,
  QuoteLoading,
  QuoteNotFound,
} from './components/status-pages';
import { PaymentScheduleSection, StickySummary, type ChosenTotals } from './components/totals';
import { subtractMoney } from './lib/money';
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
  if (!token) return <QuoteNotFound />;
  return (
    <QuoteScreen
      token={token}
      paymentReturn={paymentReturnFrom(search)}
      pollMs={pollMs}
      pollForMs={pollForMs}
    />
  );
}

function awaitingDeposit(view: QuoteView | undefined): boolean {
  return view?.state === 'accepted' && view.payment?.status !== 'paid';
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
    confirming && !waitedOut && awaitingDeposit(view) ? pollMs : false,
  );
  const { refetch } = query;
  const checkAgain = useCallback(() => {
    setWaitedOut(false);
    setRound((n) => n + 1);
    void refetch();
  }, [refetch]);

  const view = query.data;
  useEffect(() => {
    if (view) document.title = `Quote ${view.estimate.number} from ${view.company.name}`;
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

/** The quote itself, in its three states: open (choose and accept), accepted, declined. */
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
  const open = view.state === 'open';
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

  return (
    <Container size={720} px="xs" py="md">
      <Stack gap="md">
        <QuoteHeader view={view} token={token} />
        <Stack gap="md" component="main">
          <QuoteTitle view={view} token={token} />
          {view.state === 'accepted' && (
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
          {view.state === 'declined' && <DeclinedPanel view={view} focus={answeredHere} />}
          <HighlightsSection view={view} />
          <ScopeSection view={view} />
          <IncludedSection view={view} />
          <DrawingsSection view={view} />
          <PriceSection view={view} chosenIds={shownIds} onToggle={open ? toggle : undefined} />
          {open && <StickySummary view={view} totals={totals} acceptHref={`#${ACCEPT_ID}`} />}
          {view.state !== 'declined' && (
            <PaymentScheduleSection
              view={view}
              totals={totals}
              depositPaid={view.payment?.status === 'paid'}
            />
          )}
          <TermsSection view={view} />
          <SafetySection view={view} />
          {open && (
            <Paper component="section" p="md" id={ACCEPT_ID} aria-labelledby={`${ACCEPT_ID}-title`}>
              <Stack gap="lg">
                <div>
                  <Title order={2} fz="h4" id={`${ACCEPT_ID}-title`} mb="sm">
                    Accept this quote
                  </Title>
                  <AcceptForm
                    view={view}
                    token={token}
                    optionIds={live.optionIds}
                    totals={totals}
                    onAccepted={() => setAnsweredHere(true)}
                  />
                </div>
                <Divider />
                <DeclineForm view={view} token={token} onDeclined={() => setAnsweredHere(true)} />
              </Stack>
            </Paper>
          )}
        </Stack>
        <QuoteFooter view={view} token={token} />
      </Stack>
    </Container>
  );
}
