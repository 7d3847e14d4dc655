import { Anchor, Code, Group, List, Paper, Stack, Tabs, Text, Title } from '@mantine/core';
import type { MailboxMessage } from '@pondwright/shared';
import { IconPaperclip } from '@tabler/icons-react';
import { messageLinks } from '../utils/message-links';
import { formatReceived, formatSize } from './mailbox-format';

/**
 * One captured e-mail. The HTML is shown inside a sandboxed frame (`sandbox=""`: no scripts, no
 * forms, no navigation, a unique origin), so nothing in a message can reach the app; its links are
 * listed beside it as ordinary anchors instead.
 */
export function MessageView({ message }: { message: MailboxMessage }) {
  const links = messageLinks(message);
  return (
    <Paper p="md" component="article" aria-labelledby="mailbox-message-subject">
      <Stack gap="md">
        <div>
          <Title order={2} fz="h4" id="mailbox-message-subject">
            {message.subject || '(no subject)'}
          </Title>
          <Text size="sm" c="dimmed">
            From {message.from} to {message.to.join(', ')} · {formatReceived(message.receivedAt)}
          </Text>
        </div>

        <section aria-labelledby="mailbox-links-title">
          <Title order={3} fz="h6" id="mailbox-links-title" mb={4}>
            Links in this message
          </Title>
          {links.length === 0 ? (
            <Text size="sm" c="dimmed">
              No links.
            </Text>
          ) : (
            <List size="sm" spacing={4} aria-labelledby="mailbox-links-title">
              {links.map((link) => (
                <List.Item key={link}>
                  <Anchor href={link} style={{ wordBreak: 'break-all' }}>
                    {link}
                  </Anchor>
                </List.Item>
              ))}
            </List>
          )}
        </section>

        {message.attachments.length > 0 && (
          <section aria-labelledby="mailbox-attachments-title">
            <Title order={3} fz="h6" id="mailbox-attachments-title" mb={4}>
              Attachments
            </Title>
            <List size="sm" spacing={4} aria-labelledby="mailbox-attachments-title">
              {message.attachments.map((attachment, index) => (
                <List.Item key={`${attachment.filename}-${index}`}>
                  <Group gap={6} wrap="nowrap">
                    <IconPaperclip size={14} aria-hidden />
                    <Text size="sm">
                      {attachment.filename} · {attachment.contentType} ·{' '}
                      {formatSize(attachment.size)}
                    </Text>
                  </Group>
                </List.Item>
              ))}
            </List>
          </section>
        )}

        <Tabs defaultValue={message.html ? 'html' : 'text'} keepMounted={false}>
          <Tabs.List>
            {message.html && <Tabs.Tab value="html">HTML</Tabs.Tab>}
            <Tabs.Tab value="text">Plain text</Tabs.Tab>
          </Tabs.List>
          {message.html && (
            <Tabs.Panel value="html" pt="sm">
              <iframe
                title="The message as HTML"
                sandbox=""
                srcDoc={message.html}
                style={{
                  width: '100%',
                  height: 520,
                  border: '1px solid var(--mantine-color-default-border)',
                  borderRadius: 'var(--mantine-radius-sm)',
                  background: 'white',
                }}
              />
            </Tabs.Panel>
          )}
          <Tabs.Panel value="text" pt="sm">
            <Code block style={{ whiteSpace: 'pre-wrap', wordBreak: 'break-word' }}>
              {message.text || '(no text part)'}
            </Code>
          </Tabs.Panel>
        </Tabs>
      </Stack>
    </Paper>
  );
}
