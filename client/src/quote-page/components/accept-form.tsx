import type { QuoteView } from '@pondwright/shared';
import { useRef, useState, type FormEvent, type ReactNode } from 'react';
import { useAcceptQuote, useRefreshQuote } from '../api/quote-queries';
import { isQuoteRequestError, quoteErrorMessage } from '../api/quote-request';
import { browser } from '../lib/browser';
import { Alert } from '../ui/alert';
import { Button } from '../ui/button';
import { CheckboxField } from '../ui/checkbox-field';
import { TextField } from '../ui/text-fields';

// The same words as `acceptQuoteRequestSchema`, checked here by hand so zod stays out of the bundle.
const NAME_MESSAGE = 'Type your full name';
const NAME_TOO_LONG = 'Use at most 120 characters';

/** What is being accepted: the quote, or a change order on the job made from it. */
export type AcceptSubject = 'quote' | 'change';

const WORDS = {
  quote: {
    form: 'Accept this quote',
    nameHint: 'Typing your name here is how you sign the quote.',
    consent: 'I accept this quote, the options I chose and the terms above',
    consentMissing: 'Tick the box to agree to the quote and its terms',
    changedTitle: 'This quote has changed',
    changed: 'This quote was updated; reload to see the new version',
    reload: 'Reload the quote',
    submit: 'Accept quote',
  },
  change: {
    form: 'Accept this change',
    nameHint: 'Typing your name here is how you sign the change.',
    consent: 'I agree to this change and its price, on the terms of my quote',
    consentMissing: 'Tick the box to agree to the change',
    changedTitle: 'This change has been updated',
    changed: 'This change was updated; reload to see the new version',
    reload: 'Reload the page',
    submit: 'Accept change',
  },
} satisfies Record<AcceptSubject, Record<string, string>>;

type FieldErrors = { fullName?: string; consent?: string };
type FormProblem = { kind: 'version' | 'other'; message: string };

type AcceptFormProps = {
  view: QuoteView;
  token: string;
  /** A quote (the default) or a change order, which has no options to send. */
  subject?: AcceptSubject;
  optionIds: string[];
  /** What accepting means in money, shown above the name. */
  summary: ReactNode;
  onAccepted: () => void;
};

/** Name, consent, "Accept quote" (or "Accept change"): sends the options chosen and the version shown. */
export function AcceptForm({
  view,
  token,
  subject = 'quote',
  optionIds,
  summary,
  onAccepted,
}: AcceptFormProps) {
  const words = WORDS[subject];
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
    if (!consent) found.consent = words.consentMissing;
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
              message: words.changed,
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
    <form onSubmit={submit} noValidate aria-label={words.form}>
      <div className="qp-stack">
        <p>{summary}</p>
        <TextField
          ref={nameInput}
          label="Your full name"
          hint={words.nameHint}
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
        <CheckboxField
          ref={consentInput}
          label={words.consent}
          checked={consent}
          onChange={(event) => {
            setConsent(event.currentTarget.checked);
            if (errors.consent) setErrors((e) => ({ ...e, consent: undefined }));
          }}
          error={errors.consent}
          required
        />
        {problem && (
          <Alert
            ref={problemBox}
            tabIndex={-1}
            role="alert"
            tone={problem.kind === 'version' ? 'clay' : 'red'}
            title={problem.kind === 'version' ? words.changedTitle : 'We couldn’t record that'}
          >
            <div className="qp-stack" data-gap="xs" data-align="start">
              <p>{problem.message}</p>
              {problem.kind === 'version' && (
                <Button size="xs" variant="clay" onClick={() => browser.reload()}>
                  {words.reload}
                </Button>
              )}
            </div>
          </Alert>
        )}
        <Button type="submit" size="md" loading={accept.isPending} fullWidth>
          {words.submit}
        </Button>
      </div>
    </form>
  );
}
