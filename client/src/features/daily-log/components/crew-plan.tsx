import { Accordion, List, Text } from '@mantine/core';
import type { CrewBudgetLine } from '@pondwright/shared';
import { TASK_LABELS, unitLabel } from '../utils/labels';

const GROUPS: Array<{ category: CrewBudgetLine['category']; title: string }> = [
  { category: 'labor', title: 'Hours' },
  { category: 'materials', title: 'Materials' },
  { category: 'equipment', title: 'Equipment' },
  { category: 'disposal', title: 'Disposal' },
  { category: 'other', title: 'Other' },
];

function lineText(line: CrewBudgetLine): string {
  const what = line.category === 'labor' && line.task ? TASK_LABELS[line.task] : line.description;
  return `${what}: ${line.quantity} ${unitLabel(line.unit)}`;
}

/** What the job was planned with, in quantities only: the crew builds from it, the office prices it. */
export function CrewPlan({ lines }: { lines: CrewBudgetLine[] }) {
  if (lines.length === 0) return null;
  return (
    <Accordion variant="separated" aria-label="The job's plan">
      <Accordion.Item value="plan">
        <Accordion.Control>The job’s plan</Accordion.Control>
        <Accordion.Panel>
          {GROUPS.map(({ category, title }) => {
            const group = lines.filter((line) => line.category === category);
            if (group.length === 0) return null;
            return (
              <div key={category}>
                <Text fw={600} size="sm" mt="xs">
                  {title}
                </Text>
                <List size="sm" spacing={2} aria-label={title}>
                  {group.map((line) => (
                    <List.Item key={line.id}>{lineText(line)}</List.Item>
                  ))}
                </List>
              </div>
            );
          })}
        </Accordion.Panel>
      </Accordion.Item>
    </Accordion>
  );
}
