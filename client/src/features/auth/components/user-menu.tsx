import { Avatar, Group, Menu, Stack, Text, UnstyledButton } from '@mantine/core';
import { ROLE_LABELS } from '@pondwright/shared';
import { IconChevronDown, IconLogout } from '@tabler/icons-react';
import { useSignOut } from '../api/sign-out';
import { useSignedInUser } from '../hooks/use-signed-in-user';

function initials(name: string): string {
  const parts = name.trim().split(/\s+/);
  return `${parts[0]?.[0] ?? ''}${parts.length > 1 ? (parts.at(-1)?.[0] ?? '') : ''}`.toUpperCase();
}

export function UserMenu() {
  const user = useSignedInUser();
  const signOut = useSignOut();

  return (
    <Menu position="bottom-end" withinPortal>
      <Menu.Target>
        <UnstyledButton aria-label={`Account menu for ${user.name}`}>
          <Group gap="xs" wrap="nowrap">
            <Avatar color="clay" radius="xl" size="md">
              {initials(user.name)}
            </Avatar>
            <Stack gap={0} visibleFrom="xs">
              <Text size="sm" fw={600} lh={1.2}>
                {user.name}
              </Text>
              <Text size="xs" c="dimmed" lh={1.2}>
                {ROLE_LABELS[user.role]} · {user.companyName}
              </Text>
            </Stack>
            <IconChevronDown size={14} />
          </Group>
        </UnstyledButton>
      </Menu.Target>
      <Menu.Dropdown>
        <Menu.Label>Signed in as {user.email}</Menu.Label>
        <Menu.Item
          leftSection={<IconLogout size={16} />}
          onClick={() => signOut.mutate()}
          disabled={signOut.isPending}
        >
          Sign out
        </Menu.Item>
      </Menu.Dropdown>
    </Menu>
  );
}
