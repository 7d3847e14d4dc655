import { Alert, Anchor, List, Text } from '@mantine/core';
import type { FieldError } from '@pondwright/shared/engine';
import { IconAlertCircle } from '@tabler/icons-react';
import { describeField } from '../utils/field-labels';

type ErrorSummaryProps = {
  title: string;
  errors: readonly FieldError[];
  onShowField: (field: string) => void;
  children?: React.ReactNode;
};

/** Every field message in one place, each a link to its input. */
export function ErrorSummary({ title, errors, onShowField, children }: ErrorSummaryProps) {
  return (
    <Alert color="red" variant="light" icon={<IconAlertCircle />} title={title} role="alert">
      {children}
      <List size="sm" spacing={4}>
        {errors.map((error) => (
          <List.Item key={error.field}>
            <Anchor
              component="button"
              type="button"
              size="sm"
              fw={600}
              c="red.9"
              onClick={() => onShowField(error.field)}
            >
              {describeField(error.field)}
            </Anchor>
            <Text span size="sm">
              : {error.message}
            </Text>
          </List.Item>
        ))}
      </List>
    </Alert>
  );
}
