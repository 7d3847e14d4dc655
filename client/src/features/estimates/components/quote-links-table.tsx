import { Badge, Button, Table, Text, VisuallyHidden } from '@mantine/core';
import type { QuoteLinkView } from '@pondwright/shared';
import { useState } from 'react';
import { ConfirmDialog } from '@/components/confirm-dialog';
import { notifySuccess } from '@/lib/notify';
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
                    <EmailDelivery email={link.email} />
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

/** Whether the quote e-mail has left: the outbox retries through a mail-server outage. */
function EmailDelivery({ email }: { email: QuoteLinkView['email'] }) {
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
      <Text size="xs" c="red.7" title={email.lastError ?? undefined}>
        E-mail not delivered after {email.attempts} tries: check the address, then resend
      </Text>
    );
  }
  return (
    <Text size="xs" c="clay.7" title={email.lastError ?? undefined}>
      {email.attempts === 0 ? 'E-mail queued' : `E-mail retrying (tried ${email.attempts}×)`}
    </Text>
  );
}
