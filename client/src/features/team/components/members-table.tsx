import {
  Alert,
  Badge,
  Button,
  EmptyState,
  Group,
  NativeSelect,
  Table,
  Text,
  VisuallyHidden,
} from '@mantine/core';
import { ROLE_LABELS, roleSchema, type TeamMember } from '@pondwright/shared';
import { IconUsers } from '@tabler/icons-react';
import { useState } from 'react';
import { ConfirmDialog } from '@/components/confirm-dialog';
import { ErrorPanel } from '@/components/error-panel';
import { TableSkeleton } from '@/components/table-skeleton';
import { errorMessage, isApiError } from '@/lib/api-error';
import { formatDate } from '@/lib/format';
import { notifyApiError, notifySuccess } from '@/lib/notify';
import { useMembers } from '../api/get-members';
import { useUpdateMember, type MemberChange } from '../api/update-member';
import { roleOptions } from './role-options';

type MembersTableProps = {
  currentUserId: string;
  /** Called after the signed-in owner changed their own role or status. */
  onOwnAccountChanged?: () => void;
};

type PendingChange = { member: TeamMember; change: MemberChange };

function describeChange({ member, change }: PendingChange): {
  title: string;
  body: string;
  confirm: string;
} {
  if (change.active === false) {
    return {
      title: `Deactivate ${member.name}?`,
      body: `${member.name} will no longer be able to sign in. Their past work stays in the records, and you can reactivate them later.`,
      confirm: 'Deactivate',
    };
  }
  if (change.active === true) {
    return {
      title: `Reactivate ${member.name}?`,
      body: `${member.name} will be able to sign in again as ${ROLE_LABELS[member.role]}.`,
      confirm: 'Reactivate',
    };
  }
  const role = change.role ? ROLE_LABELS[change.role] : '';
  return {
    title: `Change your own role to ${role}?`,
    body: 'You will lose access to owner pages, including this one, as soon as the change is saved.',
    confirm: 'Change my role',
  };
}

function failureTitle(error: unknown): string {
  return isApiError(error, 409)
    ? 'The company needs an active owner'
    : 'Could not update this member';
}

export function MembersTable({ currentUserId, onOwnAccountChanged }: MembersTableProps) {
  const members = useMembers();
  const update = useUpdateMember();
  const [pending, setPending] = useState<PendingChange | null>(null);
  const [inlineError, setInlineError] = useState<unknown>(null);

  const apply = ({ member, change }: PendingChange) => {
    setInlineError(null);
    update.mutate(
      { id: member.id, change },
      {
        onSuccess: (updated) => {
          setPending(null);
          notifySuccess(
            `${updated.name} is now ${updated.active ? ROLE_LABELS[updated.role] : 'deactivated'}.`,
            'Team updated',
          );
          if (updated.id === currentUserId) onOwnAccountChanged?.();
        },
        onError: (error) => {
          if (!pending) setInlineError(error);
          notifyApiError(error, failureTitle(error));
        },
      },
    );
  };

  const ask = (change: PendingChange) => {
    update.reset();
    setPending(change);
  };

  if (members.isPending) return <TableSkeleton label="Loading members" />;
  if (members.isError) {
    return (
      <ErrorPanel
        title="Could not load the team"
        error={members.error}
        onRetry={() => members.refetch()}
      />
    );
  }
  if (members.data.length === 0) {
    return (
      <EmptyState
        icon={<IconUsers />}
        title="No members yet"
        description="People you invite appear here once they join."
      />
    );
  }

  const dialog = pending ? describeChange(pending) : null;

  return (
    <>
      {inlineError !== null && (
        <Alert
          color="red"
          variant="light"
          title={failureTitle(inlineError)}
          withCloseButton
          closeButtonLabel="Dismiss"
          onClose={() => setInlineError(null)}
          mb="md"
          role="alert"
        >
          {errorMessage(inlineError)}
        </Alert>
      )}
      <Table.ScrollContainer minWidth={720}>
        <Table aria-label="Team members">
          <Table.Thead>
            <Table.Tr>
              <Table.Th>Name</Table.Th>
              <Table.Th>E-mail</Table.Th>
              <Table.Th>Role</Table.Th>
              <Table.Th>Status</Table.Th>
              <Table.Th>Joined</Table.Th>
              <Table.Th>
                <VisuallyHidden>Actions</VisuallyHidden>
              </Table.Th>
            </Table.Tr>
          </Table.Thead>
          <Table.Tbody>
            {members.data.map((member) => {
              const isSelf = member.id === currentUserId;
              const busy = update.isPending && update.variables?.id === member.id;
              return (
                <Table.Tr key={member.id} c={member.active ? undefined : 'dimmed'}>
                  <Table.Td>
                    <Group gap="xs" wrap="nowrap">
                      <Text size="sm" fw={600}>
                        {member.name}
                      </Text>
                      {isSelf && (
                        <Badge size="xs" variant="outline" color="stone">
                          You
                        </Badge>
                      )}
                    </Group>
                  </Table.Td>
                  <Table.Td>{member.email}</Table.Td>
                  <Table.Td>
                    <NativeSelect
                      aria-label={`Role for ${member.name}`}
                      data={roleOptions}
                      value={member.role}
                      disabled={busy || !member.active}
                      size="xs"
                      onChange={(event) => {
                        const role = roleSchema.parse(event.currentTarget.value);
                        const change = { member, change: { role } };
                        if (isSelf && role !== 'owner') ask(change);
                        else apply(change);
                      }}
                    />
                  </Table.Td>
                  <Table.Td>
                    <Badge variant="light" color={member.active ? 'reed' : 'stone'}>
                      {member.active ? 'Active' : 'Deactivated'}
                    </Badge>
                  </Table.Td>
                  <Table.Td>{formatDate(member.createdAt)}</Table.Td>
                  <Table.Td>
                    <Button
                      size="xs"
                      variant="subtle"
                      color={member.active ? 'red' : 'reed'}
                      disabled={busy}
                      aria-label={`${member.active ? 'Deactivate' : 'Reactivate'} ${member.name}`}
                      onClick={() => ask({ member, change: { active: !member.active } })}
                    >
                      {member.active ? 'Deactivate' : 'Reactivate'}
                    </Button>
                  </Table.Td>
                </Table.Tr>
              );
            })}
          </Table.Tbody>
        </Table>
      </Table.ScrollContainer>
      <ConfirmDialog
        opened={pending !== null}
        title={dialog?.title ?? ''}
        confirmLabel={dialog?.confirm ?? 'Confirm'}
        confirmColor={pending?.change.active === true ? undefined : 'red'}
        loading={update.isPending}
        error={update.error}
        onConfirm={() => pending && apply(pending)}
        onCancel={() => setPending(null)}
      >
        {dialog?.body}
      </ConfirmDialog>
    </>
  );
}
