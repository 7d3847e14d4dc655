import { Component, lazy, Suspense, useState, type ComponentType, type ReactNode } from 'react';
import { browser } from '../lib/browser';
import { Alert } from './alert';
import { Button } from './button';
import { Spinner } from './spinner';

type Loader<P> = () => Promise<ComponentType<P>>;

const everyPart: Array<() => Promise<unknown>> = [];

/**
 * A part of the page whose code comes in its own chunk, fetched when the part first renders (or on
 * `preload()`): leaving out what the quote's first paint does not need keeps the JavaScript a phone
 * loads and runs before it small. Meanwhile the part shows `loadingPlaceholder`, sized to hold its
 * place so the page does not jump; with `{ boundary: 'parent' }` it waits instead in the nearest
 * `PartBoundary` above it, for parts that lead the page and have no sensible placeholder.
 */
export function deferred<P extends object>(
  load: Loader<P>,
  { boundary = 'own' }: { boundary?: 'own' | 'parent' } = {},
) {
  let loaded: ComponentType<P> | null = null;
  let loading: Promise<ComponentType<P>> | null = null;
  const preload = () => {
    loading ??= load().then(
      (part) => (loaded = part),
      (error: unknown) => {
        // A dropped connection: a later call may try again (a part that failed to render offers a reload).
        loading = null;
        throw error;
      },
    );
    return loading;
  };
  everyPart.push(preload);
  const Lazy = lazy(() => preload().then((part) => ({ default: part })));

  function Deferred({ loadingPlaceholder, ...props }: P & { loadingPlaceholder?: ReactNode }) {
    // Chosen once per mount: switching from the lazy wrapper to the loaded part would remount it
    // and lose what the homeowner typed.
    const [Part] = useState<ComponentType<P>>(() => loaded ?? Lazy);
    const part = <Part {...(props as P)} />;
    if (Part !== Lazy || boundary === 'parent') return part;
    return <PartBoundary fallback={loadingPlaceholder ?? <PartLoading />}>{part}</PartBoundary>;
  }
  return Object.assign(Deferred, { preload });
}

/** Where deferred parts wait for their code, and what shows if it cannot be fetched. */
export function PartBoundary({ fallback, children }: { fallback: ReactNode; children: ReactNode }) {
  return (
    <LoadFailed>
      <Suspense fallback={fallback}>{children}</Suspense>
    </LoadFailed>
  );
}

/** Loads every deferred part now; tests await it so each part renders at once, as before. */
export function preloadDeferredParts(): Promise<unknown> {
  return Promise.all(everyPart.map((preload) => preload()));
}

function PartLoading() {
  return (
    <div className="qp-part-loading" role="status">
      <Spinner size="sm" />
      <span className="qp-sm qp-dimmed">Loading…</span>
    </div>
  );
}

/** A part whose code could not be fetched (the phone lost its signal): offer a reload. */
class LoadFailed extends Component<{ children: ReactNode }, { failed: boolean }> {
  override state = { failed: false };

  static getDerivedStateFromError() {
    return { failed: true };
  }

  override render() {
    if (!this.state.failed) return this.props.children;
    return (
      <Alert tone="red" role="alert" title="Part of this page didn’t load">
        <div className="qp-stack" data-gap="xs" data-align="start">
          <p>Check your connection, then reload the page.</p>
          <Button size="xs" variant="default" onClick={() => browser.reload()}>
            Reload the page
          </Button>
        </div>
      </Alert>
    );
  }
}
