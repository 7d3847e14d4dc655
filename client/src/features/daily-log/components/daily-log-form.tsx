import { Alert, Button, Paper, Stack, Textarea } from '@mantine/core';
import { useForm } from '@mantine/form';
import type { DailyLogView } from '@pondwright/shared';
import { IconDeviceFloppy } from '@tabler/icons-react';
import { useCallback, useEffect, useRef, useState } from 'react';
import { notifyError, notifySuccess } from '@/lib/notify';
import { useLogPhotos } from '../hooks/use-log-photos';
import { useOutbox } from '../hooks/use-outbox';
import { readDraft, writeDraft, type LogDraft } from '../storage/draft-store';
import { rememberLoadVolume } from '../storage/load-size-store';
import { outboxSync } from '../sync/outbox-sync';
import { photoSync } from '../sync/photo-sync';
import type { CrewLine } from '../utils/crew-budget';
import { checkLog, problemToErrors, type LogValues } from '../utils/log-values';
import { ConflictPanel } from './conflict-panel';
import { LogEntries } from './log-entries';
import { LogPhotos } from './log-photos';
import { LogStatus } from './log-status';
import { PhotoAdderContext } from './photo-adder';
import { RejectedPanel } from './rejected-panel';

export type DailyLogFormProps = {
  userId: string;
  jobLabel: string;
  /** Where the form is kept on the phone as it is typed. */
  draftKey: string;
  initial: LogDraft;
  lines: CrewLine[];
  people: string[];
  /** The load size disposal in loads starts with (see `defaultLoadVolume`); '' for none. */
  defaultLoadVolume: string;
  /** The server's copy of this log, when it has one. */
  stored: DailyLogView | null;
  onUseSaved: (stored: DailyLogView) => void;
};

export function DailyLogForm(props: DailyLogFormProps) {
  const { userId, jobLabel, draftKey, initial, lines, people, defaultLoadVolume } = props;
  const { stored, onUseSaved } = props;
  const { logId, jobId, logDate } = initial;
  const outbox = useOutbox();
  const item = outbox.items.find((queued) => queued.logId === logId) ?? null;
  const [dirty, setDirty] = useState(initial.dirty);
  const [unkept, setUnkept] = useState(false);
  const [saving, setSaving] = useState(false);
  const [lastSaved, setLastSaved] = useState<DailyLogView | null>(null);

  const form = useForm<LogValues>({
    mode: 'controlled',
    initialValues: initial.values,
    // Every change goes to the phone's storage at once: a reload or a flat battery keeps the typing.
    onValuesChange: (values) => {
      setDirty(true);
      const draft = readDraft(draftKey) ?? initial;
      setUnkept(
        !writeDraft(draftKey, {
          ...draft,
          values,
          dirty: true,
          updatedAt: new Date().toISOString(),
        }),
      );
    },
  });

  useEffect(() => outboxSync.onSaved((log) => log.id === logId && setLastSaved(log)), [logId]);

  // A photo may go at once only when the server has the day's log (revision 0: never stored).
  const logOnServer = useCallback(
    () => (readDraft(draftKey)?.baseRevision ?? initial.baseRevision) > 0,
    [draftKey, initial.baseRevision],
  );
  const photos = useLogPhotos({ jobId, logId, userId, logOnServer });

  // The server's field messages go on the fields once per refusal, wherever those rows now are.
  const shownProblem = useRef<string | null>(null);
  useEffect(() => {
    if (item?.status !== 'rejected' || !item.problem || shownProblem.current === item.saveId)
      return;
    shownProblem.current = item.saveId;
    form.setErrors(problemToErrors(item.problem, form.getValues()));
  }, [item, form]);

  const save = async () => {
    const values = form.getValues();
    // The revision lives with the draft, where this phone's own successful sends move it on.
    const baseRevision = readDraft(draftKey)?.baseRevision ?? initial.baseRevision;
    const checked = checkLog(values, logDate, baseRevision);
    if (!checked.ok) {
      form.setErrors(checked.errors);
      notifyError('Some fields need another look before the log can be saved.', 'Not saved yet');
      return;
    }
    // The size as sent (a decimal point, not the comma a number pad may offer) for the next log.
    const loadVolume = checked.request.entries
      .flatMap((entry) => (entry.kind === 'disposal' ? [entry.loadVolumeLooseCubicYards] : []))
      .filter((size) => size !== undefined)
      .at(-1);
    if (loadVolume !== undefined) rememberLoadVolume(userId, loadVolume);
    try {
      outboxSync.save({ logId, jobId, userId, jobLabel, request: checked.request });
    } catch {
      notifyError(
        'This phone has no room left to keep the log. Keep this page open and save again with a connection.',
        'Not saved',
      );
      return;
    }
    writeDraft(draftKey, {
      ...initial,
      baseRevision,
      values,
      dirty: false,
      updatedAt: new Date().toISOString(),
    });
    setDirty(false);
    setSaving(true);
    try {
      await outboxSync.syncNow(userId);
    } finally {
      setSaving(false);
    }
    // The day's photos waited for the log; they follow it now, without holding up the save button.
    void photoSync.syncNow(userId);
    const after = outboxSync.getSnapshot().items.find((queued) => queued.logId === logId);
    if (!after) notifySuccess('The day’s log is saved.');
    else if (after.status === 'waiting') {
      notifySuccess(
        'Kept on this phone. It is sent as soon as there is a connection.',
        'Waiting to send',
      );
    }
  };

  return (
    <Stack gap="md" pb="md">
      {unkept && (
        <Alert color="clay" variant="light" title="This phone is not keeping your typing">
          Its storage is full or switched off. Save while you have a connection.
        </Alert>
      )}
      {item?.status === 'conflict' && (
        <ConflictPanel
          item={item}
          onKeepMine={(storedRevision) => {
            outboxSync.keepMine(logId, storedRevision);
            void outboxSync.syncNow(userId);
          }}
          onUseSaved={(current) => {
            outboxSync.drop(logId);
            onUseSaved(current);
          }}
        />
      )}
      {item?.status === 'rejected' && (
        <RejectedPanel item={item} onDiscard={() => outboxSync.drop(logId)} />
      )}

      <PhotoAdderContext.Provider value={photos.add}>
        <LogEntries
          form={form}
          lines={lines}
          people={people}
          defaultLoadVolume={defaultLoadVolume}
        />
      </PhotoAdderContext.Provider>

      <LogPhotos queue={photos} />

      <Paper p="sm">
        <Textarea
          label="Notes"
          description="Weather, access, anything the office should know."
          size="md"
          rows={4}
          {...form.getInputProps('notes')}
        />
      </Paper>

      {/* Stays in reach of the thumb however long the day's list grows. */}
      <Paper withBorder p="sm" pos="sticky" bottom={0} style={{ zIndex: 2 }} shadow="sm">
        <Stack gap="xs">
          <LogStatus
            item={item}
            sending={outbox.sendingLogId === logId}
            signInNeeded={outbox.signInNeeded}
            dirty={dirty}
            saved={lastSaved ?? stored}
          />
          <Button
            size="lg"
            fullWidth
            leftSection={<IconDeviceFloppy size={20} />}
            loading={saving}
            onClick={() => void save()}
          >
            Save the day’s log
          </Button>
        </Stack>
      </Paper>
    </Stack>
  );
}
