import { Badge, Button, EmptyState, Table, Text, VisuallyHidden } from '@mantine/core';
import { ROLE_LABELS, type PendingInvite } from '@pondwright/shared';
import { IconMailOpened } from '@tabler/icons-react';
import { useState } from 'react';
import { ConfirmDialog } from '@/components/confirm-dialog';
import { ErrorPanel } from '@/components/error-panel';
import { TableSkeleton } from '@/components/table-skeleton';
import { formatDate } from '@/lib/format';
import { notifySuccess } from '@/lib/notify';
import { useInvites } from '../api/get-invites';
import { useRevokeInvite } from '../api/revoke-invite';

export function InvitesTable() {
  const invites = useInvites();
  const revoke = useRevokeInvite();
  const [toRevoke, setToRevoke] = useState<PendingInvite | null>(null);

  if (invites.isPending) return <TableSkeleton rows={2} label="Loading invites" />;
  if (invites.isError) {
    return (
      <ErrorPanel
        title="Could not load pending invites"
        error={invites.error}
        onRetry={() => invites.refetch()}
      />
    );
  }
  if (invites.data.length === 0) {
    return (
      <EmptyState
        size="sm"
        icon={<IconMailOpened />}
        title="No pending invites"
        description="Invites you send wait here until they are accepted, revoked or expire."
      />
    );
  }

  const now = Date.now();

  return (
    <>
      <Table.ScrollContainer minWidth={640}>
        <Table aria-label="Pending invites">
          <Table.Thead>
            <Table.Tr>
              <Table.Th>E-mail</Table.Th>
              <Table.Th>Role</Table.Th>
              <Table.Th>Invited by</Table.Th>
              <Table.Th>Expires</Table.Th>
              <Table.Th>
                <VisuallyHidden>Actions</VisuallyHidden>
              </Table.Th>
            </Table.Tr>
          </Table.Thead>
          <Table.Tbody>
            {invites.data.map((invite) => {
              const expired = new Date(invite.expiresAt).getTime() < now;
              return (
                <Table.Tr key={invite.id}>
                  <Table.Td>{invite.email}</Table.Td>
                  <Table.Td>
                    <Badge variant="light" color="stone">
                      {ROLE_LABELS[invite.role]}
                    </Badge>
                  </Table.Td>
                  <Table.Td>{invite.invitedByName}</Table.Td>
                  <Table.Td>
                    {expired ? (
                      <Badge variant="light" color="clay">
                        Expired
                      </Badge>
                    ) : (
                      <Text size="sm">{formatDate(invite.expiresAt)}</Text>
                    )}
                  </Table.Td>
                  <Table.Td>
                    <Button
                      size="xs"
                      variant="subtle"
                      color="red"
                      aria-label={`Revoke invite for ${invite.email}`}
                      onClick={() => {
                        revoke.reset();
                        setToRevoke(invite);
                      }}
                    >
                      Revoke
                    </Button>
                  </Table.Td>
                </Table.Tr>
              );
            })}
          </Table.Tbody>
        </Table>
      </Table.ScrollContainer>
      <ConfirmDialog
        opened={toRevoke !== null}
        title="Revoke this invite?"
        confirmLabel="Revoke invite"
        confirmColor="red"
        loading={revoke.isPending}
        error={revoke.error}
        onCancel={() => setToRevoke(null)}
        onConfirm={() =>
          toRevoke &&
          revoke.mutate(toRevoke.id, {
            onSuccess: () => {
              notifySuccess(`The invite for ${toRevoke.email} no longer works.`, 'Invite revoked');
              setToRevoke(null);
            },
          })
        }
      >
        The link sent to {toRevoke?.email} will stop working. You can invite them again at any time.
      </ConfirmDialog>
    </>
  );
}
