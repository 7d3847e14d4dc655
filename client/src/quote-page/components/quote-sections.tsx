import type { QuoteView } from '@pondwright/shared';
import { useState } from 'react';
import { quoteUrl } from '../api/quote-request';
import { formatDay } from '../lib/format';
import type { LinkKind } from '../lib/link-kind';
import { ButtonLink } from '../ui/button';
import { CrossSectionSvg, DrawingSpace, PlanSvg } from './deferred-parts';
import { Section } from './section';

/** A plain download link (the PDF needs no sign-in); named for what it gets. */
export function PdfLink({ token, fullWidth }: { token: string; fullWidth?: boolean }) {
  return (
    <ButtonLink href={quoteUrl(token, '/pdf')} variant="default" fullWidth={fullWidth}>
      Download PDF
    </ButtonLink>
  );
}

/** The company's logo and name. */
export function QuoteHeader({ view, token }: { view: QuoteView; token: string }) {
  const [logoFailed, setLogoFailed] = useState(false);
  return (
    <header className="qp-header">
      {view.company.hasLogo && !logoFailed && (
        <img
          className="qp-logo"
          src={quoteUrl(token, '/logo')}
          alt={`${view.company.name} logo`}
          onError={() => setLogoFailed(true)}
        />
      )}
      <p className="qp-company">{view.company.name}</p>
    </header>
  );
}

function eyebrow(view: QuoteView, kind: LinkKind): string {
  const { estimate } = view;
  if (kind === 'invoice') return `Final invoice · quote ${estimate.number}`;
  if (kind === 'change' && view.changeOrder) {
    return `Change ${view.changeOrder.number} · quote ${estimate.number}`;
  }
  return `Quote ${estimate.number}${estimate.versionNumber > 1 ? ` · version ${estimate.versionNumber}` : ''}`;
}

/** The quote's number, title, customer, site and dates, and the PDF link. */
export function QuoteTitle({
  view,
  token,
  kind = 'quote',
}: {
  view: QuoteView;
  token: string;
  kind?: LinkKind;
}) {
  const { estimate } = view;
  return (
    <div className="qp-stack" data-gap="xs">
      <div>
        <p className="qp-sm qp-strong qp-dimmed">{eyebrow(view, kind)}</p>
        <h1 className="qp-h1">{estimate.title}</h1>
      </div>
      <dl className="qp-facts">
        <dt>Prepared for</dt>
        <dd>{estimate.customerName}</dd>
        {estimate.siteAddress && (
          <>
            <dt>Site</dt>
            <dd>{estimate.siteAddress}</dd>
          </>
        )}
        {kind === 'invoice' && view.invoice ? (
          <>
            <dt>Invoice date</dt>
            <dd>{formatDay(view.invoice.issuedAt)}</dd>
          </>
        ) : (
          <>
            <dt>{kind === 'change' ? 'Sent' : 'Issued'}</dt>
            <dd>{formatDay(estimate.issuedAt)}</dd>
            {kind !== 'change' ? (
              <>
                <dt>Valid until</dt>
                <dd>{formatDay(estimate.expiresAt)}</dd>
              </>
            ) : (
              view.changeOrder?.state === 'open' && (
                <>
                  <dt>Answer by</dt>
                  <dd>{formatDay(estimate.expiresAt)}</dd>
                </>
              )
            )}
          </>
        )}
      </dl>
      <div>
        <PdfLink token={token} />
      </div>
    </div>
  );
}

export function HighlightsSection({ view }: { view: QuoteView }) {
  if (view.highlights.length === 0) return null;
  return (
    <Section title="Your water feature">
      <dl className="qp-highlights">
        {view.highlights.map((h) => (
          <div key={h.label}>
            <dt>{h.label}</dt>
            <dd>{h.value}</dd>
          </div>
        ))}
      </dl>
    </Section>
  );
}

/** The scope in the estimator's words: paragraphs split by blank lines. */
export function ScopeSection({ view }: { view: QuoteView }) {
  const paragraphs = view.scope
    .split(/\n\s*\n/)
    .map((p) => p.trim())
    .filter(Boolean);
  if (paragraphs.length === 0) return null;
  return (
    <Section title="What we’ll build">
      <div className="qp-stack qp-scope" data-gap="sm">
        {paragraphs.map((p, i) => (
          <p key={i}>{p}</p>
        ))}
      </div>
    </Section>
  );
}

export function IncludedSection({ view }: { view: QuoteView }) {
  if (view.included.length === 0) return null;
  return (
    <Section title="What’s included">
      <ul className="qp-list">
        {view.included.map((item) => (
          <li key={item}>{item}</li>
        ))}
      </ul>
    </Section>
  );
}

/** The plan and the cross-sections, drawn from the data the server computed. */
export function DrawingsSection({ view }: { view: QuoteView }) {
  const { plan, sections } = view.drawings;
  if (!plan && sections.length === 0) return null;
  return (
    <Section title="Drawings">
      <div className="qp-stack">
        {plan && (
          <figure className="qp-figure">
            <figcaption>From above</figcaption>
            <PlanSvg plan={plan} loadingPlaceholder={<DrawingSpace bounds={plan.boundsFt} />} />
          </figure>
        )}
        {sections.map((section) => (
          <figure className="qp-figure" key={section.basinIndex}>
            <figcaption>
              {sections.length > 1
                ? `Cross-section of pond ${section.basinIndex + 1}`
                : 'Cross-section'}
            </figcaption>
            <CrossSectionSvg
              section={section}
              loadingPlaceholder={<DrawingSpace bounds={section.boundsFt} section />}
            />
          </figure>
        ))}
        <p className="qp-sm qp-dimmed">
          The drawings show the planned shape and depths; depths may be drawn taller than scale so
          the shelves are easy to see. They are a guide, not a survey.
        </p>
      </div>
    </Section>
  );
}

/**
 * The terms the link was sent with, one item per paragraph: plain text from the server (React escapes
 * it), its line breaks inside a paragraph kept.
 */
export function TermsSection({ view }: { view: QuoteView }) {
  if (view.terms.length === 0) return null;
  return (
    <Section title="Terms">
      <ol className="qp-list qp-sm">
        {view.terms.map((term, i) => (
          // Inline: the company's line breaks are part of its words, so they hold even without the stylesheet.
          <li key={i} style={{ whiteSpace: 'pre-line', overflowWrap: 'anywhere' }}>
            {term}
          </li>
        ))}
      </ol>
    </Section>
  );
}

/** Always shown: water, electricity and digging need care whatever the quote says. */
export const SAFETY_LINE = 'Follow your local codes; electrical work by a licensed electrician.';

export function SafetySection({ view }: { view: QuoteView }) {
  return (
    <Section title="Safety">
      <ul className="qp-list qp-sm">
        {view.cautions.map((caution, i) => (
          <li key={i}>{caution}</li>
        ))}
        <li className="qp-strong">{SAFETY_LINE}</li>
      </ul>
    </Section>
  );
}

const FOOTER_SUBJECT: Record<LinkKind, string> = {
  quote: 'this quote',
  change: 'this change',
  invoice: 'this invoice',
};

/** Who to write to with a question. */
export function QuoteFooter({
  view,
  token,
  kind = 'quote',
}: {
  view: QuoteView;
  token: string;
  kind?: LinkKind;
}) {
  const email = view.company.replyToEmail;
  return (
    <footer className="qp-stack qp-footer" data-gap="xs">
      <p className="qp-sm qp-dimmed qp-center">
        Questions about {FOOTER_SUBJECT[kind]}?{' '}
        {email ? (
          <>
            Write to {view.company.name} at <a href={`mailto:${email}`}>{email}</a>.
          </>
        ) : (
          `Contact ${view.company.name}.`
        )}
      </p>
      <PdfLink token={token} />
    </footer>
  );
}
