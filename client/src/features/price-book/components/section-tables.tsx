import {
  DISPOSAL_BASES,
  EQUIPMENT_USES,
  type Disposal,
  type Equipment,
  type LaborRole,
} from '@pondwright/shared/pricing';
import { DataTable, type DataTableColumn } from '@/components/data-table';
import { formatMoney, formatPercent } from '@/lib/format';
import type { PriceBookDraft, TableSection } from '../hooks/use-price-book-draft';

type SectionTableProps = { draft: PriceBookDraft; readOnly: boolean };

/** Reads a cell's error from the draft by the book's dotted path. */
export function cellErrorFor(draft: PriceBookDraft, section: TableSection) {
  return (index: number, key: string) => draft.errors[`${section}.${index}.${key}`];
}

function text<Row>(key: keyof Row & string) {
  return {
    type: 'text' as const,
    get: (row: Row) => String(row[key] ?? ''),
    set: (row: Row, value: string) => ({ ...row, [key]: value }),
  };
}

function number<Row>(key: keyof Row & string) {
  return {
    type: 'number' as const,
    get: (row: Row) => row[key] as number | string | undefined,
    set: (row: Row, value: number | string | undefined) => ({ ...row, [key]: value }),
  };
}

const byText =
  <Row,>(key: keyof Row & string) =>
  (row: Row) =>
    String(row[key] ?? '');
const byAmount =
  <Row,>(key: keyof Row & string) =>
  (row: Row) =>
    Number(row[key]) || 0;

export const codeColumn = <Row extends { code: string }>(): DataTableColumn<Row> => ({
  key: 'code',
  header: 'Code',
  editor: text<Row>('code'),
  sortValue: byText<Row>('code'),
  minWidth: 140,
});

export const nameColumn = <Row extends { name: string }>(): DataTableColumn<Row> => ({
  key: 'name',
  header: 'Name',
  editor: text<Row>('name'),
  sortValue: byText<Row>('name'),
  minWidth: 220,
});

export function moneyColumn<Row>(key: keyof Row & string, header: string): DataTableColumn<Row> {
  return {
    key,
    header,
    editor: text<Row>(key),
    render: (row) => formatMoney(String(row[key] ?? '')),
    sortValue: byAmount<Row>(key),
    align: 'right',
    minWidth: 130,
  };
}

const laborColumns: Array<DataTableColumn<LaborRole>> = [
  codeColumn(),
  nameColumn(),
  moneyColumn('wagePerHour', 'Wage per hour'),
  {
    key: 'burdenPct',
    header: 'Burden %',
    editor: text<LaborRole>('burdenPct'),
    render: (row) => formatPercent(row.burdenPct),
    sortValue: byAmount<LaborRole>('burdenPct'),
    align: 'right',
  },
];

export function LaborTable({ draft, readOnly }: SectionTableProps) {
  return (
    <DataTable
      label="Labor roles"
      rows={draft.draft.laborRoles}
      columns={laborColumns}
      rowLabel={(row, index) => row.code || `new role ${index + 1}`}
      searchText={(row) => `${row.code} ${row.name}`}
      readOnly={readOnly}
      cellError={cellErrorFor(draft, 'laborRoles')}
      onRowChange={(index, row) => draft.updateRow('laborRoles', index, row)}
      onAdd={() =>
        draft.addRow('laborRoles', { code: '', name: '', wagePerHour: '', burdenPct: '25' })
      }
      addLabel="Add a labor role"
      onDelete={(index) => draft.deleteRow('laborRoles', index)}
      emptyLabel="No labor roles yet. Every book needs at least one."
    />
  );
}

const USE_LABELS: Record<(typeof EQUIPMENT_USES)[number], string> = {
  excavation: 'Excavation',
  rock: 'Rock work',
  other: 'Other',
};

const equipmentColumns: Array<DataTableColumn<Equipment>> = [
  codeColumn(),
  nameColumn(),
  {
    key: 'use',
    header: 'Use',
    editor: {
      type: 'select',
      options: EQUIPMENT_USES.map((use) => ({ value: use, label: USE_LABELS[use] })),
      get: (row) => row.use,
      set: (row, value) => ({ ...row, use: value as Equipment['use'] }),
    },
    sortValue: byText<Equipment>('use'),
  },
  moneyColumn('dailyRate', 'Daily rate'),
  {
    key: 'minimumDays',
    header: 'Minimum days',
    editor: number<Equipment>('minimumDays'),
    sortValue: (row) => row.minimumDays,
    align: 'right',
  },
  moneyColumn('deliveryFee', 'Delivery fee'),
  {
    key: 'widthIn',
    header: 'Width (in)',
    editor: number<Equipment>('widthIn'),
    sortValue: (row) => row.widthIn,
    align: 'right',
  },
];

export function EquipmentTable({ draft, readOnly }: SectionTableProps) {
  return (
    <DataTable
      label="Equipment"
      rows={draft.draft.equipment}
      columns={equipmentColumns}
      rowLabel={(row, index) => row.code || `new machine ${index + 1}`}
      searchText={(row) => `${row.code} ${row.name}`}
      filter={{
        label: 'Filter by use',
        options: EQUIPMENT_USES.map((use) => ({ value: use, label: USE_LABELS[use] })),
        matches: (row, value) => row.use === value,
      }}
      readOnly={readOnly}
      cellError={cellErrorFor(draft, 'equipment')}
      onRowChange={(index, row) => draft.updateRow('equipment', index, row)}
      onAdd={() =>
        draft.addRow('equipment', {
          code: '',
          name: '',
          use: 'excavation',
          dailyRate: '',
          minimumDays: 1,
          deliveryFee: '0',
          widthIn: 36,
        })
      }
      addLabel="Add equipment"
      onDelete={(index) => draft.deleteRow('equipment', index)}
      emptyLabel="No equipment yet."
    />
  );
}

const BASIS_LABELS: Record<(typeof DISPOSAL_BASES)[number], string> = {
  'per-loose-cu-yd': 'Per loose cu yd',
  'per-short-ton': 'Per short ton',
};

const disposalColumns: Array<DataTableColumn<Disposal>> = [
  codeColumn(),
  nameColumn(),
  {
    key: 'basis',
    header: 'Charged',
    editor: {
      type: 'select',
      options: DISPOSAL_BASES.map((basis) => ({ value: basis, label: BASIS_LABELS[basis] })),
      get: (row) => row.basis,
      set: (row, value) => ({ ...row, basis: value as Disposal['basis'] }),
    },
    sortValue: byText<Disposal>('basis'),
  },
  moneyColumn('unitCost', 'Unit cost'),
];

export function DisposalTable({ draft, readOnly }: SectionTableProps) {
  return (
    <DataTable
      label="Disposal"
      rows={draft.draft.disposal}
      columns={disposalColumns}
      rowLabel={(row, index) => row.code || `new disposal ${index + 1}`}
      searchText={(row) => `${row.code} ${row.name}`}
      readOnly={readOnly}
      cellError={cellErrorFor(draft, 'disposal')}
      onRowChange={(index, row) => draft.updateRow('disposal', index, row)}
      onAdd={() =>
        draft.addRow('disposal', { code: '', name: '', basis: 'per-loose-cu-yd', unitCost: '' })
      }
      addLabel="Add a way to dispose of spoil"
      onDelete={(index) => draft.deleteRow('disposal', index)}
      emptyLabel="No disposal yet. Every book needs at least one."
    />
  );
}
