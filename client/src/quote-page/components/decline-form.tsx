import type { QuoteView } from '@pondwright/shared';
import { useEffect, useRef, useState, type FormEvent } from 'react';
import { useDeclineQuote, useRefreshQuote } from '../api/quote-queries';
import { isQuoteRequestError, quoteErrorMessage } from '../api/quote-request';
import { Alert } from '../ui/alert';
import { Button } from '../ui/button';
import { TextAreaField } from '../ui/text-fields';
import type { AcceptSubject } from './accept-form';

const WORDS = {
  quote: {
    heading: 'Not going ahead?',
    intro: 'You can add a note if you like.',
    form: 'Decline this quote',
    submit: 'Decline quote',
  },
  change: {
    heading: 'Rather not make this change?',
    intro: 'Your project goes ahead as agreed before. You can add a note if you like.',
    form: 'Decline this change',
    submit: 'Decline change',
  },
} satisfies Record<AcceptSubject, Record<string, string>>;

/** "Decline" opens an optional reason; declining can't be undone here, so it takes a second click. */
export function DeclineForm({
  view,
  token,
  subject = 'quote',
  onDeclined,
}: {
  view: QuoteView;
  token: string;
  /** A quote (the default) or a change order. */
  subject?: AcceptSubject;
  onDeclined: () => void;
}) {
  const words = WORDS[subject];
  const decline = useDeclineQuote(token);
  const refresh = useRefreshQuote(token);
  const [open, setOpen] = useState(false);
  const [reason, setReason] = useState('');
  const [reasonError, setReasonError] = useState<string | null>(null);
  const [error, setError] = useState<string | null>(null);
  const reasonInput = useRef<HTMLTextAreaElement>(null);
  const opener = useRef<HTMLButtonElement>(null);

  useEffect(() => {
    if (open) reasonInput.current?.focus();
  }, [open]);

  const close = () => {
    setOpen(false);
    setError(null);
    setReasonError(null);
    requestAnimationFrame(() => opener.current?.focus());
  };

  const submit = (event: FormEvent) => {
    event.preventDefault();
    setError(null);
    setReasonError(null);
    const text = reason.trim();
    decline.mutate(text ? { reason: text } : {}, {
      onSuccess: onDeclined,
      onError: (failure) => {
        const details = isQuoteRequestError(failure) ? failure.details : [];
        const onReason = details.find((d) => d.field === 'reason');
        if (onReason) {
          setReasonError(onReason.message);
          reasonInput.current?.focus();
          return;
        }
        setError(details[0]?.message ?? quoteErrorMessage(failure));
        if (isQuoteRequestError(failure) && failure.code === 'QUOTE_ALREADY_ANSWERED') {
          void refresh();
        }
      },
    });
  };

  return (
    <div className="qp-stack" data-gap="xs">
      <h3 className="qp-h5">{words.heading}</h3>
      {open ? (
        <form onSubmit={submit} noValidate aria-label={words.form}>
          <div className="qp-stack" data-gap="sm">
            <TextAreaField
              ref={reasonInput}
              label="Would you like to say why? (optional)"
              hint={`Your note goes to ${view.company.name}. It helps them, but you don’t have to give a reason.`}
              rows={4}
              maxLength={2000}
              value={reason}
              onChange={(event) => setReason(event.currentTarget.value)}
              error={reasonError}
            />
            {error && (
              <Alert tone="red" role="alert" title="We couldn’t record that">
                <p>{error}</p>
              </Alert>
            )}
            <div className="qp-row">
              <Button type="submit" variant="danger-light" loading={decline.isPending}>
                {words.submit}
              </Button>
              <Button variant="subtle" onClick={close} disabled={decline.isPending}>
                Cancel
              </Button>
            </div>
          </div>
        </form>
      ) : (
        <>
          <p className="qp-sm qp-dimmed">
            Let {view.company.name} know. {words.intro}
          </p>
          <div>
            <Button ref={opener} variant="default" onClick={() => setOpen(true)}>
              Decline
            </Button>
          </div>
        </>
      )}
    </div>
  );
}
