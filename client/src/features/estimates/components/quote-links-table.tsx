import { Badge, Button, Stack, Table, Text, VisuallyHidden } from '@mantine/core';
import type { QuoteLinkView } from '@pondwright/shared';
import { IconSend } from '@tabler/icons-react';
import { useState } from 'react';
import { ConfirmDialog } from '@/components/confirm-dialog';
import { notifyApiError, notifySuccess } from '@/lib/notify';
import { useRetryQuoteEmail } from '../api/retry-quote-email';
import { useRevokeQuoteLink } from '../api/revoke-quote-link';
import { formatDateTime } from './quote-format';

const LINK_STATUS: Record<QuoteLinkView['status'], { label: string; color: string }> = {
  active: { label: 'Active', color: 'blue' },
  expired: { label: 'Expired', color: 'stone' },
  revoked: { label: 'Revoked', color: 'red' },
  used: { label: 'Used', color: 'reed' },
};

type QuoteLinksTableProps = {
  estimateId: string;
  links: QuoteLinkView[];
  /** An accepted quote is read-only: its links are kept as a record. */
  readOnly?: boolean;
};

/** Every link sent for the estimate, newest first, with a way to stop an active one working. */
export function QuoteLinksTable({ estimateId, links, readOnly = false }: QuoteLinksTableProps) {
  const [revoking, setRevoking] = useState<QuoteLinkView | null>(null);
  const revoke = useRevokeQuoteLink();
  const sorted = [...links].sort((a, b) => b.createdAt.localeCompare(a.createdAt));

  const close = () => {
    setRevoking(null);
    revoke.reset();
  };

  return (
    <>
      <Table.ScrollContainer minWidth={720}>
        <Table aria-label="Links sent" verticalSpacing={6}>
          <Table.Thead>
            <Table.Tr>
              <Table.Th>Version</Table.Th>
              <Table.Th>Sent to</Table.Th>
              <Table.Th>Status</Table.Th>
              <Table.Th>Sent</Table.Th>
              <Table.Th>First viewed</Table.Th>
              <Table.Th>Expires</Table.Th>
              {!readOnly && (
                <Table.Th>
                  <VisuallyHidden>Actions</VisuallyHidden>
                </Table.Th>
              )}
            </Table.Tr>
          </Table.Thead>
          <Table.Tbody>
            {sorted.map((link) => {
              const status = LINK_STATUS[link.status];
              return (
                <Table.Tr key={link.id}>
                  <Table.Td>v{link.versionNumber}</Table.Td>
                  <Table.Td>{link.recipientEmail}</Table.Td>
                  <Table.Td>
                    <Badge color={status.color} variant="light" tt="none">
                      {status.label}
                    </Badge>
                  </Table.Td>
                  <Table.Td>
                    {formatDateTime(link.createdAt)}
                    <Text size="xs" c="dimmed">
                      by {link.createdByName}
                    </Text>
                    <EmailDelivery
                      estimateId={estimateId}
                      link={link}
                      canSendAgain={!readOnly && link.status === 'active'}
                    />
                  </Table.Td>
                  <Table.Td>{formatDateTime(link.firstViewedAt) || 'Not yet'}</Table.Td>
                  <Table.Td>
                    {link.status === 'revoked' && link.revokedAt
                      ? `Revoked ${formatDateTime(link.revokedAt)}`
                      : formatDateTime(link.expiresAt)}
                  </Table.Td>
                  {!readOnly && (
                    <Table.Td ta="right">
                      {link.status === 'active' && (
                        <Button
                          size="xs"
                          variant="subtle"
                          color="red"
                          aria-label={`Revoke the link sent to ${link.recipientEmail}`}
                          onClick={() => setRevoking(link)}
                        >
                          Revoke
                        </Button>
                      )}
                    </Table.Td>
                  )}
                </Table.Tr>
              );
            })}
          </Table.Tbody>
        </Table>
      </Table.ScrollContainer>
      <ConfirmDialog
        opened={revoking !== null}
        title="Revoke this link?"
        confirmLabel="Revoke link"
        confirmColor="red"
        loading={revoke.isPending}
        error={revoke.error}
        onCancel={close}
        onConfirm={() => {
          if (!revoking) return;
          revoke.mutate(
            { id: estimateId, linkId: revoking.id },
            {
              onSuccess: () => {
                notifySuccess(`The link sent to ${revoking.recipientEmail} no longer works.`);
                close();
              },
            },
          );
        }}
      >
        {revoking?.recipientEmail} will no longer be able to open the quote from this link. You can
        send a new link at any time.
      </ConfirmDialog>
    </>
  );
}

type EmailDeliveryProps = {
  estimateId: string;
  link: QuoteLinkView;
  /** Only a link the homeowner can still use is worth e-mailing again. */
  canSendAgain: boolean;
};

/**
 * Whether the quote e-mail has left: the outbox retries through a mail-server outage, and once it has
 * given up, staff see why and may send it again.
 */
function EmailDelivery({ estimateId, link, canSendAgain }: EmailDeliveryProps) {
  const { email } = link;
  if (!email) return null;
  if (email.status === 'sent') {
    return (
      <Text size="xs" c="reed.7">
        E-mail delivered {formatDateTime(email.sentAt)}
      </Text>
    );
  }
  if (email.status === 'failed') {
    return (
      <Stack gap={2} align="flex-start">
        <Text size="xs" c="red.7">
          E-mail not delivered after {email.attempts} tries
        </Text>
        {email.lastError && (
          <Text size="xs" c="dimmed" lineClamp={2} title={email.lastError}>
            Last error: {email.lastError}
          </Text>
        )}
        {canSendAgain ? (
          <SendAgainButton estimateId={estimateId} emailId={email.id} to={link.recipientEmail} />
        ) : (
          <Text size="xs" c="dimmed">
            Check the address, then resend the quote
          </Text>
        )}
      </Stack>
    );
  }
  return (
    <Text size="xs" c="clay.7" title={email.lastError ?? undefined}>
      {email.attempts > 0
        ? `E-mail retrying (tried ${email.attempts}×)`
        : email.retriedAt
          ? 'E-mail queued again'
          : 'E-mail queued'}
    </Text>
  );
}

function SendAgainButton({
  estimateId,
  emailId,
  to,
}: {
  estimateId: string;
  emailId: string;
  to: string;
}) {
  const retry = useRetryQuoteEmail();
  return (
    <Button
      size="compact-xs"
      variant="light"
      leftSection={<IconSend size={12} aria-hidden />}
      aria-label={`Send the e-mail to ${to} again`}
      loading={retry.isPending}
      onClick={() =>
        retry.mutate(
          { estimateId, emailId },
          {
            onSuccess: () => notifySuccess(`The e-mail to ${to} is queued to be sent again.`),
            onError: (error) => notifyApiError(error, 'The e-mail was not sent again'),
          },
        )
      }
    >
      Send again
    </Button>
  );
}
