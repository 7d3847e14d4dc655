import { Spinner } from '../ui/spinner';

/** While the quote (or the code for what it shows) is on its way. */
export function QuoteLoading() {
  return (
    <main className="qp-container qp-status-page qp-loading" aria-busy="true">
      <Spinner />
      <p className="qp-dimmed" role="status">
        Loading your quote…
      </p>
    </main>
  );
}
