import { Alert, Anchor, Stack, Text, Title } from '@mantine/core';
import type { Caution } from '@pondwright/shared/engine';
import { IconAlertTriangle, IconShieldExclamation } from '@tabler/icons-react';

type CautionsListProps = {
  cautions: Caution[];
  /** Takes the user to the input a caution is about. */
  onShowField: (field: string) => void;
};

function CautionAlert({
  caution,
  onShowField,
}: { caution: Caution } & Pick<CautionsListProps, 'onShowField'>) {
  const safety = caution.severity === 'caution';
  return (
    <Alert
      color={safety ? 'clay' : 'yellow'}
      variant={safety ? 'light' : 'outline'}
      icon={safety ? <IconShieldExclamation /> : <IconAlertTriangle />}
      p="sm"
    >
      <Text size="sm">{caution.message}</Text>
      {caution.field && (
        // Reed 8: the primary reed 7 reads only 4.2:1 on a clay alert.
        <Anchor
          component="button"
          type="button"
          size="xs"
          c="reed.8"
          onClick={() => onShowField(caution.field!)}
        >
          Show the field
        </Anchor>
      )}
    </Alert>
  );
}

/** Design warnings first, then safety cautions, which always defer to local codes and professionals. */
export function CautionsList({ cautions, onShowField }: CautionsListProps) {
  const warnings = cautions.filter((c) => c.severity === 'warning');
  const safety = cautions.filter((c) => c.severity === 'caution');
  return (
    <Stack gap="md">
      {warnings.length > 0 && (
        <section aria-labelledby="takeoff-warnings-title">
          <Title order={3} fz="h5" id="takeoff-warnings-title" mb="xs">
            Check the design
          </Title>
          <Stack gap="xs">
            {warnings.map((caution) => (
              <CautionAlert
                key={`${caution.code}-${caution.field}`}
                caution={caution}
                onShowField={onShowField}
              />
            ))}
          </Stack>
        </section>
      )}
      {safety.length > 0 && (
        <section aria-labelledby="takeoff-safety-title">
          <Title order={3} fz="h5" id="takeoff-safety-title">
            Safety
          </Title>
          <Text size="xs" c="dimmed" mb="xs">
            Local codes, the inspector and licensed professionals have the final word.
          </Text>
          <Stack gap="xs">
            {safety.map((caution) => (
              <CautionAlert
                key={`${caution.code}-${caution.field}`}
                caution={caution}
                onShowField={onShowField}
              />
            ))}
          </Stack>
        </section>
      )}
    </Stack>
  );
}
