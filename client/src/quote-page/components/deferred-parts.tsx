import { depthExaggeration, spansOf, type BoundsFt } from '@pondwright/shared/drawings';
import { deferred } from '../ui/deferred';

// The open quote's first paint needs none of these. The forms sit at the foot of the page and the
// drawings halfway down, each with a placeholder; the answered parts lead the page for a quote that
// was answered (or a change or invoice link), so the page waits for them in its loading state.
const answerForms = () => import('./answer-forms');
export const AcceptForm = deferred(() => answerForms().then((m) => m.AcceptForm));
export const DeclineForm = deferred(() => answerForms().then((m) => m.DeclineForm));

const answeredParts = () => import('./answered-parts');
const leadsPage = { boundary: 'parent' } as const;
export const AcceptedPanel = deferred(
  () => answeredParts().then((m) => m.AcceptedPanel),
  leadsPage,
);
export const DeclinedPanel = deferred(
  () => answeredParts().then((m) => m.DeclinedPanel),
  leadsPage,
);
export const PaymentPanel = deferred(() => answeredParts().then((m) => m.PaymentPanel), leadsPage);
export const InvoiceSection = deferred(
  () => answeredParts().then((m) => m.InvoiceSection),
  leadsPage,
);
export const ChangeOrderSection = deferred(
  () => answeredParts().then((m) => m.ChangeOrderSection),
  leadsPage,
);
export const ChangeAnsweredPanel = deferred(
  () => answeredParts().then((m) => m.ChangeAnsweredPanel),
  leadsPage,
);

// A link that leads nowhere is rare: its page can wait for its code.
const statusPages = () => import('./status-pages');
export const QuoteNotFound = deferred(() => statusPages().then((m) => m.QuoteNotFound), leadsPage);
export const QuoteLinkGone = deferred(() => statusPages().then((m) => m.QuoteLinkGone), leadsPage);
export const QuoteLoadFailed = deferred(
  () => statusPages().then((m) => m.QuoteLoadFailed),
  leadsPage,
);

const drawings = { boundary: 'own' } as const;
export const PlanSvg = deferred(
  () => import('@/components/drawings/plan-svg').then((m) => m.PlanSvg),
  drawings,
);
export const CrossSectionSvg = deferred(
  () => import('@/components/drawings/cross-section-svg').then((m) => m.CrossSectionSvg),
  drawings,
);

/**
 * The room a drawing will take while its code loads. The sizes are `fitDrawing`'s in
 * components/drawings/drawing-parts.tsx: 320 units wide, 40 of them padding left and right, 12 above
 * and below; a cross-section's depths are stretched as it draws them.
 */
export function DrawingSpace({ bounds, section }: { bounds: BoundsFt; section?: boolean }) {
  const { spanXFt, spanYFt } = spansOf(bounds);
  const stretch = section ? depthExaggeration(bounds) : 1;
  const height = Math.round(((320 - 2 * 40) / spanXFt) * spanYFt * stretch + 2 * 12);
  return (
    <div className="qp-drawing-space" role="status" style={{ aspectRatio: `320 / ${height}` }}>
      <span className="qp-sr-only">Loading the drawing…</span>
    </div>
  );
}
