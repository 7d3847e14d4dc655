import { Center } from '@mantine/core';
import { ErrorPanel } from '@/components/error-panel';
import { PageHeader } from '@/components/page-header';
import { PageLoader } from '@/components/page-loader';
import { RequireRole } from '@/features/auth/components/require-role';
import { isMailboxMissing, useMailbox } from '@/features/dev-mailbox/api/get-mailbox';
import { Mailbox } from '@/features/dev-mailbox/components/mailbox';
import { NotFoundContent } from '../not-found';

function MailboxPage() {
  const mailbox = useMailbox();
  if (mailbox.isPending) return <PageLoader label="Opening the mailbox…" />;
  // Production has no developer mailbox: the server answers 404, and so does this page.
  if (mailbox.isError && isMailboxMissing(mailbox.error)) {
    return (
      <Center py="xl">
        <NotFoundContent />
      </Center>
    );
  }
  return (
    <>
      <PageHeader
        title="Mailbox (dev)"
        description="E-mails Pondwright sent on this machine, caught before they leave it. Open one to follow its links, such as a homeowner’s quote link."
      />
      {mailbox.isError ? (
        <ErrorPanel
          title="Could not open the mailbox"
          error={mailbox.error}
          onRetry={() => void mailbox.refetch()}
        />
      ) : (
        <Mailbox messages={mailbox.data} />
      )}
    </>
  );
}

export function DevMailboxRoute() {
  return (
    <RequireRole area="devMailbox" areaName="the developer mailbox">
      <MailboxPage />
    </RequireRole>
  );
}
