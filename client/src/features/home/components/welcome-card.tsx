import { Badge, Group, Paper, Stack, Text, Title } from '@mantine/core';
import { ROLE_LABELS, type Role } from '@pondwright/shared';

type WelcomeCardProps = {
  name: string;
  role: Role;
  companyName: string;
};

function greeting(now: Date): string {
  const hour = now.getHours();
  if (hour < 12) return 'Good morning';
  if (hour < 18) return 'Good afternoon';
  return 'Good evening';
}

export function WelcomeCard({ name, role, companyName }: WelcomeCardProps) {
  const firstName = name.trim().split(/\s+/)[0] ?? name;
  return (
    <Paper p="lg" bg="reed.0" style={{ '--paper-border-color': 'var(--mantine-color-reed-2)' }}>
      <Stack gap={6}>
        <Title order={1} fz="h2">
          {greeting(new Date())}, {firstName}
        </Title>
        <Group gap="xs">
          <Text c="dimmed">You are signed in to {companyName} as</Text>
          <Badge variant="filled" color="reed">
            {ROLE_LABELS[role]}
          </Badge>
        </Group>
      </Stack>
    </Paper>
  );
}
