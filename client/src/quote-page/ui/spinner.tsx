/**
 * A turning ring, hidden from screen readers: whatever shows it also says in words what is happening
 * (a `role="status"` text, or the busy button's own label).
 */
export function Spinner({ size }: { size?: 'sm' }) {
  return <span className="qp-spinner" data-size={size} aria-hidden="true" />;
}
