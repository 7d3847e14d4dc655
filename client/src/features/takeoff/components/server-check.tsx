import { Alert, Button, Group, Stack, Table, Text } from '@mantine/core';
import {
  computeTakeoff,
  defaultEngineParameters,
  type EngineGeometry,
  type Takeoff,
} from '@pondwright/shared/engine';
import { IconAlertTriangle, IconCloudCheck, IconServerBolt } from '@tabler/icons-react';
import { useMemo } from 'react';
import { ErrorPanel } from '@/components/error-panel';
import { isApiError } from '@/lib/api-error';
import { useComputeTakeoffOnServer } from '../api/compute-takeoff';
import { compareTakeoffs } from '../utils/compare-takeoffs';
import { formatQuantity } from '../utils/format-quantity';
import { ErrorSummary } from './error-summary';

type AgreementProps = { input: unknown; server: Takeoff; geometry: EngineGeometry };

function Agreement({ input, server, geometry }: AgreementProps) {
  const browser = useMemo(
    () => computeTakeoff(input, defaultEngineParameters, geometry),
    [input, geometry],
  );
  if (!browser.ok) return null;
  const { compared, differences } = compareTakeoffs(browser.takeoff, server);
  const volume = server.explanations.find((e) => e.figure === 'water.volumeGallons');
  if (differences.length === 0) {
    return (
      <Alert color="reed" variant="light" icon={<IconCloudCheck />} title="The server agrees">
        <Text size="sm">
          All {compared} figures the server computed match the preview
          {volume ? `, water volume ${formatQuantity(volume.display)} included` : ''}.
        </Text>
      </Alert>
    );
  }
  return (
    <Alert
      color="clay"
      variant="light"
      icon={<IconAlertTriangle />}
      title={`${differences.length} of ${compared} figures differ on the server`}
    >
      <Text size="sm" mb="xs">
        The server is the authority; its figures are the ones an estimate will use. Reload the page
        to get the newest engine.
      </Text>
      <Table fz="sm" verticalSpacing={2}>
        <Table.Thead>
          <Table.Tr>
            <Table.Th>Figure</Table.Th>
            <Table.Th>Preview</Table.Th>
            <Table.Th>Server</Table.Th>
          </Table.Tr>
        </Table.Thead>
        <Table.Tbody>
          {differences.map((d) => (
            <Table.Tr key={d.figure}>
              <Table.Td>{d.label}</Table.Td>
              <Table.Td>{d.browser ? formatQuantity(d.browser) : 'none'}</Table.Td>
              <Table.Td>{d.server ? formatQuantity(d.server) : 'none'}</Table.Td>
            </Table.Tr>
          ))}
        </Table.Tbody>
      </Table>
    </Alert>
  );
}

type ServerCheckProps = {
  /** The engine input as it stands now. */
  input: unknown;
  /** The same geometry the preview uses, so the comparison is like for like. */
  geometry: EngineGeometry;
  onShowField: (field: string) => void;
};

/** Sends the input to the server's takeoff and shows whether its figures match the preview. */
export function ServerCheck({ input, geometry, onShowField }: ServerCheckProps) {
  const check = useComputeTakeoffOnServer();
  const checkedInput = check.variables;
  const changedSince =
    !check.isIdle && !check.isPending && JSON.stringify(checkedInput) !== JSON.stringify(input);
  const error = check.error;
  return (
    <Stack gap="xs">
      <Group gap="sm">
        <Button
          variant="light"
          size="sm"
          leftSection={<IconServerBolt size={16} />}
          loading={check.isPending}
          onClick={() => check.mutate(input)}
        >
          Check on server
        </Button>
        {changedSince && (
          <Text size="xs" c="dimmed">
            The measurements changed after this check.
          </Text>
        )}
      </Group>
      {check.isSuccess && (
        <Agreement input={checkedInput} server={check.data} geometry={geometry} />
      )}
      {error &&
        (isApiError(error, 400) && error.details.length > 0 ? (
          <ErrorSummary
            title="The server found problems"
            errors={error.details}
            onShowField={onShowField}
          />
        ) : (
          <ErrorPanel title="Could not check on the server" error={error} />
        ))}
    </Stack>
  );
}
