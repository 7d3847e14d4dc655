import { Group, Paper, SimpleGrid, Stack, Text, ThemeIcon, Title } from '@mantine/core';
import { IconBolt, IconMoodKid, IconShovel, IconWeight, type Icon } from '@tabler/icons-react';

type Reminder = { title: string; body: string; icon: Icon };

const REMINDERS: Reminder[] = [
  {
    title: 'Electricity near water',
    body: 'Pumps, lights and nearby outlets need GFCI protection. Lighting runs at low voltage through a transformer; any line-voltage work goes to a licensed electrician.',
    icon: IconBolt,
  },
  {
    title: 'Before you dig',
    body: 'Request utility locates a few working days ahead and keep the ticket. Hand-dig near the marks. Private lines such as irrigation, drains and lighting wire are not marked.',
    icon: IconShovel,
  },
  {
    title: 'Deep water and children',
    body: 'A small child can drown in very little water. Barrier and permit rules vary from place to place, so check them before you agree a depth.',
    icon: IconMoodKid,
  },
  {
    title: 'Heavy stone',
    body: 'Get a second person or a machine for stones over about 50 lb, and keep hands and feet out of pinch points.',
    icon: IconWeight,
  },
];

export function SafetyReminders() {
  return (
    <Paper
      p="lg"
      component="section"
      aria-labelledby="safety-title"
      bg="clay.0"
      style={{ '--paper-border-color': 'var(--mantine-color-clay-2)' }}
    >
      <Stack gap={4} mb="md">
        <Title order={2} fz="h4" id="safety-title">
          Safety on every job
        </Title>
        <Text size="sm" c="dimmed">
          Reminders, not rules: local codes, the inspector and licensed professionals have the final
          word.
        </Text>
      </Stack>
      <SimpleGrid cols={{ base: 1, sm: 2 }} spacing="lg">
        {REMINDERS.map((reminder) => (
          <Stack key={reminder.title} gap={6}>
            <Group gap="xs" wrap="nowrap">
              <ThemeIcon size="md" radius="xl" variant="light" color="clay" aria-hidden>
                <reminder.icon size={16} />
              </ThemeIcon>
              <Title order={3} fz="sm">
                {reminder.title}
              </Title>
            </Group>
            <Text size="sm">{reminder.body}</Text>
          </Stack>
        ))}
      </SimpleGrid>
    </Paper>
  );
}
