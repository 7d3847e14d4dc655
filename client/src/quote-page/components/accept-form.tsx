import { Alert, Button, Checkbox, Stack, Text, TextInput } from '@mantine/core';
import type { QuoteView } from '@pondwright/shared';
import { useRef, useState, type FormEvent } from 'react';
import { useAcceptQuote, useRefreshQuote } from '../api/quote-queries';
import { isQuoteRequestError, quoteErrorMessage } from '../api/quote-request';
import { browser } from '../lib/browser';
import { formatMoney } from '../lib/format';
import type { ChosenTotals } from './totals';

// The same words as `acceptQuoteRequestSchema`, checked here by hand so zod stays out of the bundle.
const NAME_MESSAGE = 'Type your full name';
const NAME_TOO_LONG = 'Use at most 120 characters';
const CONSENT_MESSAGE = 'Tick the box to agree to the quote and its terms';

type FieldErrors = { fullName?: string; consent?: string };
type FormProblem = { kind: 'version' | 'other'; message: string };

type AcceptFormProps = {
  view: QuoteView;
  token: string;
  optionIds: string[];
  totals: ChosenTotals;
  onAccepted: () => void;
};

/** Name, consent, "Accept quote": sends the options chosen and the version shown. */
export function AcceptForm({ view, token, optionIds, totals, onAccepted }: AcceptFormProps) {
  const accept = useAcceptQuote(token);
  const refresh = useRefreshQuote(token);
  const [fullName, setFullName] = useState('');
  const [consent, setConsent] = useState(false);
  const [errors, setErrors] = useState<FieldErrors>({});
  const [problem, setProblem] = useState<FormProblem | null>(null);
  const nameInput = useRef<HTMLInputElement>(null);
  const consentInput = useRef<HTMLInputElement>(null);
  const problemBox = useRef<HTMLDivElement>(null);

  const focusFirst = (found: FieldErrors) => {
    if (found.fullName) nameInput.current?.focus();
    else if (found.consent) consentInput.current?.focus();
  };

  const showProblem = (next: FormProblem) => {
    setProblem(next);
    // After React has drawn the alert.
    requestAnimationFrame(() => problemBox.current?.focus());
  };

  const submit = (event: FormEvent) => {
    event.preventDefault();
    setProblem(null);
    const name = fullName.trim();
    const found: FieldErrors = {};
    if (name.length < 2) found.fullName = NAME_MESSAGE;
    else if (name.length > 120) found.fullName = NAME_TOO_LONG;
    if (!consent) found.consent = CONSENT_MESSAGE;
    setErrors(found);
    if (found.fullName || found.consent) {
      focusFirst(found);
      return;
    }
    accept.mutate(
      { fullName: name, consent: true, optionIds, contentSha256: view.estimate.contentSha256 },
      {
        onSuccess: onAccepted,
        onError: (error) => {
          if (isQuoteRequestError(error) && error.code === 'QUOTE_VERSION_CHANGED') {
            showProblem({
              kind: 'version',
              message: 'This quote was updated; reload to see the new version',
            });
            return;
          }
          if (isQuoteRequestError(error) && error.code === 'QUOTE_ALREADY_ANSWERED') {
            showProblem({ kind: 'other', message: error.message });
            void refresh();
            return;
          }
          const fromServer: FieldErrors = {};
          const others: string[] = [];
          for (const detail of isQuoteRequestError(error) ? error.details : []) {
            if (detail.field === 'fullName' || detail.field === 'consent') {
              fromServer[detail.field] ??= detail.message;
            } else {
              others.push(detail.message);
            }
          }
          setErrors(fromServer);
          if (fromServer.fullName || fromServer.consent) {
            if (others.length) showProblem({ kind: 'other', message: others.join(' ') });
            focusFirst(fromServer);
          } else {
            showProblem({
              kind: 'other',
              message: others.length ? others.join(' ') : quoteErrorMessage(error),
            });
          }
        },
      },
    );
  };

  return (
    <form onSubmit={submit} noValidate aria-label="Accept this quote">
      <Stack gap="md">
        <Text>
          Your total is <strong>{formatMoney(totals.total, view.currency)}</strong> with the options
          you ticked. After you accept, you can pay the deposit of{' '}
          <strong>{formatMoney(totals.deposit, view.currency)}</strong> online.
        </Text>
        <TextInput
          ref={nameInput}
          label="Your full name"
          description="Typing your name here is how you sign the quote."
          autoComplete="name"
          required
          value={fullName}
          onChange={(event) => {
            setFullName(event.currentTarget.value);
            if (errors.fullName) setErrors((e) => ({ ...e, fullName: undefined }));
          }}
          error={errors.fullName}
          maxLength={160}
        />
        <Checkbox
          ref={consentInput}
          label="I accept this quote, the options I chose and the terms above"
          checked={consent}
          onChange={(event) => {
            setConsent(event.currentTarget.checked);
            if (errors.consent) setErrors((e) => ({ ...e, consent: undefined }));
          }}
          error={errors.consent}
          aria-invalid={errors.consent ? true : undefined}
          required
        />
        {problem && (
          <Alert
            ref={problemBox}
            tabIndex={-1}
            role="alert"
            color={problem.kind === 'version' ? 'clay' : 'red'}
            title={
              problem.kind === 'version' ? 'This quote has changed' : 'We couldn’t record that'
            }
          >
            <Stack gap="xs" align="flex-start">
              <Text fz="sm">{problem.message}</Text>
              {problem.kind === 'version' && (
                <Button size="xs" color="clay" onClick={() => browser.reload()}>
                  Reload the quote
                </Button>
              )}
            </Stack>
          </Alert>
        )}
        <Button type="submit" size="md" loading={accept.isPending} fullWidth>
          Accept quote
        </Button>
      </Stack>
    </form>
  );
}
