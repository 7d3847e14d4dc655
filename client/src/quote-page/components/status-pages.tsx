import { useEffect, useRef, type ReactNode } from 'react';
import { Button } from '../ui/button';

/** A whole-page message (not found, expired, failed), its heading focused so it is read first. */
function StatusPage({ title, children }: { title: string; children: ReactNode }) {
  const heading = useRef<HTMLHeadingElement>(null);
  useEffect(() => {
    document.title = title;
    heading.current?.focus();
  }, [title]);
  return (
    <main className="qp-container qp-status-page">
      <div className="qp-card qp-stack" data-gap="sm">
        <h1 className="qp-h2" ref={heading} tabIndex={-1}>
          {title}
        </h1>
        {children}
      </div>
    </main>
  );
}

export function QuoteNotFound() {
  return (
    <StatusPage title="We couldn’t find this quote">
      <p>
        The link may be incomplete. Open it again from the e-mail you were sent, or ask the company
        that quoted you to send it again.
      </p>
    </StatusPage>
  );
}

/** 410: the link expired or was withdrawn; the server's message names the company to contact. */
export function QuoteLinkGone({ message }: { message: string }) {
  return (
    <StatusPage title="This link has expired or was withdrawn">
      <p>{message}</p>
    </StatusPage>
  );
}

export function QuoteLoadFailed({ message, onRetry }: { message: string; onRetry: () => void }) {
  return (
    <StatusPage title="We couldn’t load your quote">
      <p>{message}</p>
      <div>
        <Button onClick={onRetry}>Try again</Button>
      </div>
    </StatusPage>
  );
}
