import { List, Paper, Stack, Text, ThemeIcon, Title } from '@mantine/core';
import type { Role } from '@pondwright/shared';
import { IconCircleCheck, IconHourglassHigh } from '@tabler/icons-react';

type Guide = { today: string[]; next: string[] };

const GUIDES: Record<Role, Guide> = {
  owner: {
    today: [
      'Invite estimators, crew leads and other owners from Team.',
      'Change anyone’s role, and switch off access for people who leave.',
      'Measure a pond on Takeoff and get its volume, liner, dig, rock, pump, lighting and labor.',
      'Set the company name and the units new takeoffs start in from Company.',
    ],
    next: [
      'Set what a crew-day costs you, your markup rules and your own price book.',
      'See the margin you actually made by job and job type after close-out.',
    ],
  },
  estimator: {
    today: [
      'Measure a pond on Takeoff and get its volume, liner, dig, rock, pump head, lighting and labor, in US or metric units.',
      'A company owner looks after who is on the team.',
    ],
    next: [
      'Capture site visits: measurements, access, utilities, soil and photos.',
      'Save takeoffs to estimates, then build quotes with options and exclusions.',
    ],
  },
  crew_lead: {
    today: ['Your account is ready. A company owner looks after who is on the team.'],
    next: [
      'Open a job packet with the plan, deliveries, access notes and locate ticket.',
      'Log phase hours, materials used and returned, and capture change orders on site.',
    ],
  },
};

function GuideList({ items, done }: { items: string[]; done: boolean }) {
  return (
    <List
      spacing="xs"
      size="sm"
      icon={
        <ThemeIcon size="sm" radius="xl" variant="light" color={done ? 'reed' : 'stone'}>
          {done ? <IconCircleCheck size={14} /> : <IconHourglassHigh size={14} />}
        </ThemeIcon>
      }
    >
      {items.map((item) => (
        <List.Item key={item}>{item}</List.Item>
      ))}
    </List>
  );
}

export function RoleGuide({ role }: { role: Role }) {
  const guide = GUIDES[role];
  return (
    <Paper p="lg" component="section" aria-labelledby="role-guide-title">
      <Title order={2} fz="h4" id="role-guide-title" mb="md">
        What you can do here
      </Title>
      <Stack gap="md">
        <div>
          <Text fw={600} size="sm" mb="xs">
            Today
          </Text>
          <GuideList items={guide.today} done />
        </div>
        <div>
          <Text fw={600} size="sm" mb="xs">
            Coming next
          </Text>
          <GuideList items={guide.next} done={false} />
        </div>
      </Stack>
    </Paper>
  );
}
