import {
  hoursEntrySchema,
  isLoadUnit,
  quantityEntrySchema,
  saveDailyLogRequestSchema,
  type DailyLogView,
  type LogEntry,
  type SaveDailyLogRequest,
} from '@pondwright/shared';
import type { LaborTask } from '@pondwright/shared/engine';
import type { OutboxProblem } from '../storage/outbox-store';
import { matchLine, type CrewLine } from './crew-budget';
import type { Movement } from './labels';
import { newId } from './new-id';

/** The form's rows hold text exactly as typed; `toRequest` turns them into the API's shape. */
export type HoursValues = {
  id: string;
  kind: 'hours';
  person: string;
  task: LaborTask | '';
  hours: string;
};

export type QuantityKind = 'material' | 'equipment' | 'disposal';

export type QuantityValues = {
  id: string;
  kind: QuantityKind;
  movement: Movement | null;
  /** The crew budget line picked; '' before one is chosen; null for something typed in. Never sent. */
  lineId: string | null;
  code: string | null;
  description: string;
  quantity: string;
  unit: string;
  unitCost: string;
  supplier: string;
  ticketNumber: string;
  /**
   * Disposal in loads: each load's nominal capacity, loose yd³, as typed. Drafts kept on the phone
   * before the field existed lack it.
   */
  loadVolumeLooseCubicYards?: string;
};

export type EntryValues = HoursValues | QuantityValues;

export type LogValues = { notes: string; entries: EntryValues[] };

export const emptyLogValues = (): LogValues => ({ notes: '', entries: [] });

export function newHoursRow(person = ''): HoursValues {
  return { id: newId(), kind: 'hours', person, task: '', hours: '' };
}

/** Disposal counted in loads, which needs each load's size. */
export const countsLoads = (entry: Pick<QuantityValues, 'kind' | 'unit'>) =>
  entry.kind === 'disposal' && isLoadUnit(entry.unit);

/**
 * A new row picks from the plan when the plan has lines of its kind, else is typed in. Disposal in
 * loads starts with `loadVolume`, the load size the crew used last.
 */
export function newQuantityRow(
  kind: QuantityKind,
  movement: Movement | null,
  { fromPlan, unit, loadVolume = '' }: { fromPlan: boolean; unit: string; loadVolume?: string },
): QuantityValues {
  return {
    id: newId(),
    kind,
    movement: kind === 'material' ? (movement ?? 'used') : null,
    lineId: fromPlan ? '' : null,
    code: null,
    description: '',
    quantity: '',
    unit,
    unitCost: '',
    supplier: '',
    ticketNumber: '',
    loadVolumeLooseCubicYards: countsLoads({ kind, unit }) ? loadVolume : '',
  };
}

/** Phones in many places offer a decimal comma on the number pad; the API wants a point. */
const decimalText = (text: string) => text.trim().replace(',', '.');
const orNull = (text: string) => (text.trim() === '' ? null : text.trim());

function toEntry(entry: EntryValues): unknown {
  if (entry.kind === 'hours') {
    return {
      id: entry.id,
      kind: 'hours',
      person: entry.person,
      task: entry.task === '' ? undefined : entry.task,
      hours: decimalText(entry.hours),
    };
  }
  // Only a delivery comes with a supplier's ticket; a hidden field's leftovers are not sent.
  const delivery = entry.kind === 'material' && entry.movement === 'delivered';
  return {
    id: entry.id,
    kind: entry.kind,
    movement: entry.kind === 'material' ? entry.movement : null,
    code: entry.code?.trim() ? entry.code.trim() : null,
    description: entry.description,
    quantity: decimalText(entry.quantity),
    unit: entry.unit,
    unitCost: delivery && entry.unitCost.trim() ? decimalText(entry.unitCost) : null,
    supplier: delivery ? orNull(entry.supplier) : null,
    ticketNumber: delivery ? orNull(entry.ticketNumber) : null,
    // Sent even when blank, so the shared rules ask for it; other rows never carry one.
    loadVolumeLooseCubicYards: countsLoads(entry)
      ? decimalText(entry.loadVolumeLooseCubicYards ?? '')
      : undefined,
  };
}

export type CheckedLog =
  { ok: true; request: SaveDailyLogRequest } | { ok: false; errors: Record<string, string> };

/**
 * Checks the log with the same zod rules the server uses. Issue paths such as `entries.2.hours` are
 * the form's own field paths, because rows are sent in the order the form holds them. Each row is
 * checked against its own kind's rules: the request's union of kinds reports a row with several
 * mistakes as one "invalid input" on the row, with no field to put it on.
 */
export function checkLog(values: LogValues, logDate: string, baseRevision: number): CheckedLog {
  const entries = values.entries.map(toEntry);
  const result = saveDailyLogRequestSchema.safeParse({
    logDate,
    notes: values.notes,
    entries,
    baseRevision,
  });
  if (result.success) return { ok: true, request: result.data };
  const errors: Record<string, string> = {};
  const add = (path: PropertyKey[], message: string) => {
    errors[path.map(String).join('.') || 'entries'] ??= message;
  };
  for (const issue of result.error.issues) {
    const [head, index] = issue.path;
    if (head !== 'entries' || typeof index !== 'number') add(issue.path, issue.message);
  }
  values.entries.forEach((entry, index) => {
    const schema = entry.kind === 'hours' ? hoursEntrySchema : quantityEntrySchema;
    const row = schema.safeParse(entries[index]);
    for (const issue of row.error?.issues ?? []) {
      add(['entries', index, ...issue.path], issue.message);
    }
  });
  return { ok: false, errors };
}

export function entryToValues(entry: LogEntry, lines: CrewLine[]): EntryValues {
  if (entry.kind === 'hours') return { ...entry };
  return {
    id: entry.id,
    kind: entry.kind,
    movement: entry.movement,
    lineId: matchLine(lines, entry.kind, entry.code, entry.description),
    code: entry.code,
    description: entry.description,
    quantity: entry.quantity,
    unit: entry.unit,
    unitCost: entry.unitCost ?? '',
    supplier: entry.supplier ?? '',
    ticketNumber: entry.ticketNumber ?? '',
    loadVolumeLooseCubicYards: entry.loadVolumeLooseCubicYards ?? '',
  };
}

/** The load size of the day's last disposal row in loads that has one. */
export function lastLoadVolume(entries: ReadonlyArray<EntryValues>): string | null {
  const sizes = entries.flatMap((entry) => {
    const size = entry.kind === 'hours' ? '' : (entry.loadVolumeLooseCubicYards?.trim() ?? '');
    return entry.kind !== 'hours' && countsLoads(entry) && size !== '' ? [size] : [];
  });
  return sizes.at(-1) ?? null;
}

export function logToValues(
  log: Pick<DailyLogView, 'notes' | 'entries'>,
  lines: CrewLine[],
): LogValues {
  return { notes: log.notes, entries: log.entries.map((entry) => entryToValues(entry, lines)) };
}

/** The server's messages for a log it refused, placed on the rows they name, wherever those rows now are. */
export function problemToErrors(problem: OutboxProblem, values: LogValues): Record<string, string> {
  const errors: Record<string, string> = {};
  for (const { entryId, field, message } of problem.fields) {
    if (entryId === null) {
      errors[field] ??= message;
      continue;
    }
    const index = values.entries.findIndex((entry) => entry.id === entryId);
    if (index >= 0) errors[`entries.${index}.${field}`] ??= message;
  }
  return errors;
}

/** Turns the server's `entries.3.hours` into "the row with this id, field hours", against what was sent. */
export function problemFromDetails(
  message: string,
  details: Array<{ field: string; message: string }>,
  request: SaveDailyLogRequest,
): OutboxProblem {
  return {
    message,
    fields: details.map((detail) => {
      const match = /^entries\.(\d+)\.(.+)$/.exec(detail.field);
      const entryId = match ? (request.entries[Number(match[1])]?.id ?? null) : null;
      return entryId && match
        ? { entryId, field: match[2]!, message: detail.message }
        : { entryId: null, field: detail.field, message: detail.message };
    }),
  };
}
