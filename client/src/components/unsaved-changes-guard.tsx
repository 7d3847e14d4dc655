import { useEffect } from 'react';
import { useBlocker, type Location } from 'react-router-dom';
import { ConfirmDialog } from './confirm-dialog';

type UnsavedChangesGuardProps = {
  /** Whether there is anything to lose. */
  when: boolean;
  /** Moves that keep the unsaved work on screen (e.g. between tabs of the same page) pass. */
  allows?: (next: Location) => boolean;
  message?: string;
};

/**
 * Asks before leaving a page with unsaved work: in-app navigation through React Router's
 * blocker, and reloads or closing the tab through the browser's own `beforeunload` prompt.
 */
export function UnsavedChangesGuard({
  when,
  allows,
  message = 'Your changes have not been saved. If you leave now they are lost.',
}: UnsavedChangesGuardProps) {
  const blocker = useBlocker(
    ({ currentLocation, nextLocation }) =>
      when &&
      currentLocation.pathname !== nextLocation.pathname &&
      !(allows?.(nextLocation) ?? false),
  );

  useEffect(() => {
    if (!when) return;
    const warn = (event: BeforeUnloadEvent) => {
      event.preventDefault();
      // Older browsers show the prompt only when returnValue is set.
      event.returnValue = '';
    };
    window.addEventListener('beforeunload', warn);
    return () => window.removeEventListener('beforeunload', warn);
  }, [when]);

  return (
    <ConfirmDialog
      opened={blocker.state === 'blocked'}
      title="Leave without saving?"
      confirmLabel="Leave and discard"
      confirmColor="red"
      onConfirm={() => blocker.proceed?.()}
      onCancel={() => blocker.reset?.()}
    >
      {message}
    </ConfirmDialog>
  );
}
