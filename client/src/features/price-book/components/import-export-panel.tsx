import {
  Alert,
  Button,
  FileInput,
  Group,
  Paper,
  Progress,
  Stack,
  Table,
  Text,
  TextInput,
  Title,
} from '@mantine/core';
import { IconDownload, IconFileSpreadsheet, IconInfoCircle, IconUpload } from '@tabler/icons-react';
import { useState } from 'react';
import { ApiError } from '@/lib/api-error';
import { todayIsoDate } from '@/lib/format';
import { notifyApiError, notifyError, notifySuccess } from '@/lib/notify';
import { useExportPriceBook } from '../api/export-price-book';
import { useImportPriceBook } from '../api/import-price-book';
import type { CsvRowError } from '../types';
import { readFileAsText } from '../utils/read-file-as-text';

type ImportExportPanelProps = {
  readOnly: boolean;
  blockedReason?: string;
};

function RowErrors({ errors }: { errors: CsvRowError[] }) {
  const sorted = [...errors].sort((a, b) => (a.line ?? 0) - (b.line ?? 0));
  return (
    <Alert color="red" variant="light" title="Nothing was imported" role="alert">
      <Text size="sm" mb="sm">
        {errors.length === 1
          ? 'One problem in the file. Correct it and import the file again.'
          : `${errors.length} problems in the file. Correct them and import the file again.`}
      </Text>
      <Table.ScrollContainer minWidth={560}>
        <Table aria-label="Rows to fix" verticalSpacing={4} bg="white">
          <Table.Thead>
            <Table.Tr>
              <Table.Th>Line</Table.Th>
              <Table.Th>Column</Table.Th>
              <Table.Th>Problem</Table.Th>
            </Table.Tr>
          </Table.Thead>
          <Table.Tbody>
            {sorted.map((error, index) => (
              <Table.Tr key={index}>
                <Table.Td>{error.line ?? '—'}</Table.Td>
                <Table.Td ff="monospace">{error.column ?? error.field}</Table.Td>
                <Table.Td>{error.message}</Table.Td>
              </Table.Tr>
            ))}
          </Table.Tbody>
        </Table>
      </Table.ScrollContainer>
    </Alert>
  );
}

/** The whole book as one CSV file, out and back in; a bad row stops the import and is named. */
export function ImportExportPanel({ readOnly, blockedReason }: ImportExportPanelProps) {
  const exporter = useExportPriceBook();
  const importer = useImportPriceBook();
  const [file, setFile] = useState<File | null>(null);
  const [csv, setCsv] = useState<string | null>(null);
  const [progress, setProgress] = useState<number | null>(null);
  const [effectiveDate, setEffectiveDate] = useState(todayIsoDate);
  const [note, setNote] = useState('');
  const [rowErrors, setRowErrors] = useState<CsvRowError[] | null>(null);

  const choose = async (chosen: File | null) => {
    setFile(chosen);
    setCsv(null);
    setRowErrors(null);
    importer.reset();
    if (!chosen) return;
    setProgress(0);
    try {
      setCsv(await readFileAsText(chosen, setProgress));
    } catch {
      notifyError('The file could not be read. Choose it again.', 'Could not read the file');
      setFile(null);
    } finally {
      setProgress(null);
    }
  };

  const startImport = () => {
    if (csv === null) return;
    setRowErrors(null);
    importer.mutate(
      { csv, effectiveDate, note: note.trim() || undefined },
      {
        onSuccess: (version) => {
          notifySuccess(
            `The file is now version ${version.versionNumber} of the price book.`,
            'Imported',
          );
          setFile(null);
          setCsv(null);
          setNote('');
        },
        onError: (error) => {
          if (error instanceof ApiError && error.statusCode === 400 && error.details.length > 0) {
            setRowErrors(error.details as CsvRowError[]);
          } else {
            notifyApiError(error, 'Could not import the file');
          }
        },
      },
    );
  };

  return (
    <Stack gap="lg" maw={860}>
      <Paper p="lg" component="section" aria-labelledby="export-title">
        <Title order={3} fz="h5" id="export-title">
          Download the book
        </Title>
        <Text size="sm" c="dimmed" mb="md">
          One CSV file with every material, labor role, machine, disposal, rate and setting, to edit
          in a spreadsheet and import back.
        </Text>
        <Button
          variant="light"
          leftSection={<IconDownload size={16} />}
          loading={exporter.isPending}
          onClick={() =>
            exporter.mutate(undefined, {
              onSuccess: (name) => notifySuccess(`Saved ${name}.`, 'Downloaded'),
              onError: (error) => notifyApiError(error, 'Could not download the book'),
            })
          }
        >
          Download CSV
        </Button>
      </Paper>

      {!readOnly && (
        <Paper p="lg" component="section" aria-labelledby="import-title">
          <Title order={3} fz="h5" id="import-title">
            Import a CSV
          </Title>
          <Text size="sm" c="dimmed" mb="md">
            The file replaces the whole book as a new version. If any row has a problem, nothing is
            imported and every problem is listed.
          </Text>
          <Stack gap="md">
            <FileInput
              label="CSV file"
              placeholder="Choose a .csv file"
              accept=".csv,text/csv"
              leftSection={<IconFileSpreadsheet size={16} />}
              clearable
              value={file}
              onChange={(chosen) => void choose(chosen)}
            />
            {progress !== null && (
              <Stack gap={4}>
                <Text size="xs" c="dimmed">
                  Reading the file…
                </Text>
                <Progress value={progress * 100} aria-label="Reading the file" animated />
              </Stack>
            )}
            {csv !== null && (
              <Text size="xs" c="dimmed">
                {csv.split(/\r?\n/).filter((line) => line.trim()).length} lines read.
              </Text>
            )}
            <Group align="flex-end" gap="sm">
              <TextInput
                type="date"
                label="Effective from"
                value={effectiveDate}
                onChange={(event) => setEffectiveDate(event.currentTarget.value)}
              />
              <TextInput
                label="Note"
                w={320}
                placeholder="Where the new prices came from"
                maxLength={500}
                value={note}
                onChange={(event) => setNote(event.currentTarget.value)}
              />
            </Group>
            {blockedReason && (
              <Alert color="clay" variant="light" icon={<IconInfoCircle />}>
                {blockedReason}
              </Alert>
            )}
            <Group>
              <Button
                leftSection={<IconUpload size={16} />}
                disabled={csv === null || Boolean(blockedReason) || !effectiveDate}
                loading={importer.isPending}
                onClick={startImport}
              >
                Import as new version
              </Button>
            </Group>
            {rowErrors && <RowErrors errors={rowErrors} />}
          </Stack>
        </Paper>
      )}
    </Stack>
  );
}
