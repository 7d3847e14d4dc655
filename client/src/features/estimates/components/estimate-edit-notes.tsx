import { Alert } from '@mantine/core';
import type { EstimateView } from '@pondwright/shared';
import { IconInfoCircle, IconLock } from '@tabler/icons-react';
import { hasLinkOut, isLocked } from '../hooks/use-estimate-editor';

/** What editing means for an estimate the homeowner has: locked once accepted, or withdrawing the link. */
export function EstimateEditNotes({ estimate }: { estimate: Pick<EstimateView, 'status'> }) {
  if (isLocked(estimate)) {
    return (
      <Alert color="stone" variant="light" icon={<IconLock />} title="Locked">
        Accepted quotes are locked. The accepted version is kept as the homeowner saw it.
      </Alert>
    );
  }
  if (hasLinkOut(estimate)) {
    return (
      <Alert
        color="clay"
        variant="light"
        icon={<IconInfoCircle />}
        title="The homeowner has a link"
      >
        Saving changes to the draft withdraws the link sent to the homeowner, so they cannot accept
        a quote that is about to change. Send the quote again once the new version is ready.
      </Alert>
    );
  }
  return null;
}
