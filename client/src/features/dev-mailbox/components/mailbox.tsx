import { Anchor, Button, Grid, Group, Paper, Stack, Table, Text } from '@mantine/core';
import type { MailboxMessage } from '@pondwright/shared';
import { IconMailOff, IconTrash } from '@tabler/icons-react';
import { useState } from 'react';
import { notifyApiError, notifySuccess } from '@/lib/notify';
import { useEmptyMailbox } from '../api/empty-mailbox';
import { formatReceived } from './mailbox-format';
import { MessageView } from './message-view';

const newestFirst = (messages: MailboxMessage[]) =>
  [...messages].sort((a, b) => b.receivedAt.localeCompare(a.receivedAt));

/** The captured e-mails, newest first; choosing one opens it beside the list. */
export function Mailbox({ messages }: { messages: MailboxMessage[] }) {
  const sorted = newestFirst(messages);
  const [selectedId, setSelectedId] = useState<string | null>(null);
  const selected = sorted.find((message) => message.id === selectedId) ?? null;
  const empty = useEmptyMailbox();

  return (
    <Stack gap="md">
      <Group justify="space-between">
        <Text size="sm" c="dimmed">
          {sorted.length === 1 ? '1 message' : `${sorted.length} messages`} · checked every 5
          seconds
        </Text>
        <Button
          variant="light"
          color="red"
          leftSection={<IconTrash size={16} />}
          disabled={sorted.length === 0}
          loading={empty.isPending}
          onClick={() =>
            empty.mutate(undefined, {
              onSuccess: () => {
                setSelectedId(null);
                notifySuccess('The mailbox is empty.');
              },
              onError: (error) => notifyApiError(error, 'Could not empty the mailbox'),
            })
          }
        >
          Empty mailbox
        </Button>
      </Group>
      <Grid gap="md">
        <Grid.Col span={{ base: 12, lg: selected ? 5 : 12 }}>
          <Paper p="xs">
            <Table.ScrollContainer minWidth={480}>
              <Table aria-label="Messages" highlightOnHover verticalSpacing={6}>
                <Table.Thead>
                  <Table.Tr>
                    <Table.Th>Received</Table.Th>
                    <Table.Th>To</Table.Th>
                    <Table.Th>Subject</Table.Th>
                    <Table.Th ta="right">Attachments</Table.Th>
                  </Table.Tr>
                </Table.Thead>
                <Table.Tbody>
                  {sorted.length === 0 && (
                    <Table.Tr>
                      <Table.Td colSpan={4}>
                        <Stack align="center" gap={4} py="lg" c="dimmed">
                          <IconMailOff size={24} aria-hidden />
                          <Text size="sm" ta="center">
                            No messages yet. E-mails the app sends while you work show up here
                            within a few seconds.
                          </Text>
                        </Stack>
                      </Table.Td>
                    </Table.Tr>
                  )}
                  {sorted.map((message) => {
                    const current = message.id === selected?.id;
                    return (
                      <Table.Tr
                        key={message.id}
                        bg={current ? 'var(--mantine-primary-color-light)' : undefined}
                      >
                        <Table.Td style={{ whiteSpace: 'nowrap' }}>
                          {formatReceived(message.receivedAt)}
                        </Table.Td>
                        <Table.Td>{message.to.join(', ')}</Table.Td>
                        <Table.Td>
                          <Anchor
                            component="button"
                            type="button"
                            size="sm"
                            ta="left"
                            fw={current ? 700 : undefined}
                            onClick={() => setSelectedId(message.id)}
                          >
                            {message.subject || '(no subject)'}
                          </Anchor>
                        </Table.Td>
                        <Table.Td ta="right">
                          {message.attachments.length === 0
                            ? '—'
                            : message.attachments.map((file) => file.filename).join(', ')}
                        </Table.Td>
                      </Table.Tr>
                    );
                  })}
                </Table.Tbody>
              </Table>
            </Table.ScrollContainer>
          </Paper>
        </Grid.Col>
        {selected && (
          <Grid.Col span={{ base: 12, lg: 7 }}>
            <MessageView message={selected} />
          </Grid.Col>
        )}
      </Grid>
    </Stack>
  );
}
