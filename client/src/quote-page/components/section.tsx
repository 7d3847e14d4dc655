import { useId, type ReactNode } from 'react';

type SectionProps = { title: string; children: ReactNode; id?: string };

/** One titled part of the quote: a card with a level-2 heading that names the region. */
export function Section({ title, children, id }: SectionProps) {
  const headingId = useId();
  return (
    <section className="qp-card" aria-labelledby={headingId} id={id}>
      <h2 className="qp-h4 qp-card-title" id={headingId}>
        {title}
      </h2>
      {children}
    </section>
  );
}

type Row = { label: string; value: string; total?: boolean; testId?: string };

/** Label-and-amount rows as a description list, the last ones optionally ruled off as a total. */
export function MoneyRows({ rows, label }: { rows: Row[]; label?: string }) {
  return (
    <dl className="qp-rows" aria-label={label}>
      {rows.map((row) => (
        <div key={row.label} className={row.total ? 'qp-total' : undefined}>
          <dt>{row.label}</dt>
          <dd data-testid={row.testId}>{row.value}</dd>
        </div>
      ))}
    </dl>
  );
}
