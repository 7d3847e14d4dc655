import { Anchor, Button, Group, List, Stack, Text, Title } from '@mantine/core';
import type { QuoteView } from '@pondwright/shared';
import { useState } from 'react';
import { CrossSectionSvg } from '@/components/drawings/cross-section-svg';
import { PlanSvg } from '@/components/drawings/plan-svg';
import { quoteUrl } from '../api/quote-request';
import { formatDay } from '../lib/format';
import type { LinkKind } from '../lib/link-kind';
import { Section } from './section';

/** A plain download link (the PDF needs no sign-in); named for what it gets. */
export function PdfLink({ token, fullWidth }: { token: string; fullWidth?: boolean }) {
  return (
    <Button
      component="a"
      href={quoteUrl(token, '/pdf')}
      variant="default"
      size="sm"
      fullWidth={fullWidth}
    >
      Download PDF
    </Button>
  );
}

/** The company's logo and name. */
export function QuoteHeader({ view, token }: { view: QuoteView; token: string }) {
  const [logoFailed, setLogoFailed] = useState(false);
  return (
    <Group component="header" gap="sm" wrap="nowrap">
      {view.company.hasLogo && !logoFailed && (
        <img
          className="qp-logo"
          src={quoteUrl(token, '/logo')}
          alt={`${view.company.name} logo`}
          onError={() => setLogoFailed(true)}
        />
      )}
      <Text fw={600} fz="lg" lh={1.25}>
        {view.company.name}
      </Text>
    </Group>
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
    <Stack gap="xs">
      <div>
        <Text c="dimmed" fz="sm" fw={600}>
          {eyebrow(view, kind)}
        </Text>
        <Title order={1} fz={{ base: 'h2', sm: 'h1' }} lh={1.2}>
          {estimate.title}
        </Title>
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
    </Stack>
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
      <Stack gap="sm" className="qp-scope">
        {paragraphs.map((p, i) => (
          <Text key={i}>{p}</Text>
        ))}
      </Stack>
    </Section>
  );
}

export function IncludedSection({ view }: { view: QuoteView }) {
  if (view.included.length === 0) return null;
  return (
    <Section title="What’s included">
      <List spacing={6} withPadding={false} styles={{ item: { paddingLeft: 4 } }}>
        {view.included.map((item) => (
          <List.Item key={item}>{item}</List.Item>
        ))}
      </List>
    </Section>
  );
}

/** The plan and the cross-sections, drawn from the data the server computed. */
export function DrawingsSection({ view }: { view: QuoteView }) {
  const { plan, sections } = view.drawings;
  if (!plan && sections.length === 0) return null;
  return (
    <Section title="Drawings">
      <Stack gap="md">
        {plan && (
          <figure className="qp-figure">
            <figcaption>From above</figcaption>
            <PlanSvg plan={plan} />
          </figure>
        )}
        {sections.map((section) => (
          <figure className="qp-figure" key={section.basinIndex}>
            <figcaption>
              {sections.length > 1
                ? `Cross-section of pond ${section.basinIndex + 1}`
                : 'Cross-section'}
            </figcaption>
            <CrossSectionSvg section={section} />
          </figure>
        ))}
        <Text fz="sm" c="dimmed">
          The drawings show the planned shape and depths; depths may be drawn taller than scale so
          the shelves are easy to see. They are a guide, not a survey.
        </Text>
      </Stack>
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
      <List type="ordered" spacing={6} fz="sm">
        {view.terms.map((term, i) => (
          <List.Item key={i} style={{ whiteSpace: 'pre-line', overflowWrap: 'anywhere' }}>
            {term}
          </List.Item>
        ))}
      </List>
    </Section>
  );
}

/** Always shown: water, electricity and digging need care whatever the quote says. */
export const SAFETY_LINE = 'Follow your local codes; electrical work by a licensed electrician.';

export function SafetySection({ view }: { view: QuoteView }) {
  return (
    <Section title="Safety">
      <List spacing={6} fz="sm">
        {view.cautions.map((caution, i) => (
          <List.Item key={i}>{caution}</List.Item>
        ))}
        <List.Item fw={600}>{SAFETY_LINE}</List.Item>
      </List>
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
    <Stack component="footer" gap="xs" align="center" py="md">
      <Text fz="sm" c="dimmed" ta="center">
        Questions about {FOOTER_SUBJECT[kind]}?{' '}
        {email ? (
          <>
            Write to {view.company.name} at <Anchor href={`mailto:${email}`}>{email}</Anchor>.
          </>
        ) : (
          `Contact ${view.company.name}.`
        )}
      </Text>
      <PdfLink token={token} />
    </Stack>
  );
}
