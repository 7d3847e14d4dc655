import { priceBookSchema, type PriceBook } from '@pondwright/shared/pricing';
import { useCallback, useMemo, useState } from 'react';
import { countBookChanges } from '../utils/book-changes';
import { issuesByPath } from '../utils/issue-messages';

export type TableSection = 'materials' | 'laborRoles' | 'equipment' | 'disposal';
type Row<S extends TableSection> = PriceBook[S][number];

function clone<T>(value: T): T {
  return structuredClone(value);
}

function withoutPrefix(errors: Record<string, string>, prefix: string): Record<string, string> {
  const kept = Object.entries(errors).filter(
    ([path]) => path !== prefix && !path.startsWith(`${prefix}.`),
  );
  return kept.length === Object.keys(errors).length ? errors : Object.fromEntries(kept);
}

/**
 * The owner's unsaved edits to the price book. Every edit is checked against the shared
 * schema at once, so an error shows on the cell being typed in; errors the server sent back
 * stay on their cell until that cell changes.
 */
export function usePriceBookDraft(saved: PriceBook) {
  const [draft, setDraft] = useState<PriceBook>(() => clone(saved));
  const [serverErrors, setServerErrors] = useState<Record<string, string>>({});

  const localErrors = useMemo(() => {
    const result = priceBookSchema.safeParse(draft);
    return result.success ? {} : issuesByPath(result.error);
  }, [draft]);
  const changeCount = useMemo(() => countBookChanges(saved, draft), [saved, draft]);
  const errors = useMemo(() => ({ ...serverErrors, ...localErrors }), [serverErrors, localErrors]);

  const updateRow = useCallback(
    <S extends TableSection>(section: S, index: number, row: Row<S>) => {
      setDraft((book) => {
        const rows = [...book[section]] as Array<Row<S>>;
        rows[index] = row;
        return { ...book, [section]: rows };
      });
      setServerErrors((current) => withoutPrefix(current, `${section}.${index}`));
    },
    [],
  );

  const addRow = useCallback(<S extends TableSection>(section: S, row: Row<S>) => {
    setDraft((book) => ({ ...book, [section]: [...book[section], row] }));
  }, []);

  const deleteRow = useCallback((section: TableSection, index: number) => {
    setDraft((book) => ({ ...book, [section]: book[section].filter((_, i) => i !== index) }));
    // The rows after it move up, so the server's row numbers no longer match.
    setServerErrors((current) => withoutPrefix(current, section));
  }, []);

  const update = useCallback(
    <K extends 'productionRates' | 'settings' | 'currency'>(key: K, value: PriceBook[K]) => {
      setDraft((book) => ({ ...book, [key]: value }));
      setServerErrors((current) => withoutPrefix(current, key));
    },
    [],
  );

  const discard = useCallback(() => {
    setDraft(clone(saved));
    setServerErrors({});
  }, [saved]);

  return {
    draft,
    errors,
    /** Problems the schema finds now; saving waits until there are none. */
    problemCount: Object.keys(localErrors).length,
    changeCount,
    setServerErrors,
    updateRow,
    addRow,
    deleteRow,
    update,
    discard,
  };
}

export type PriceBookDraft = ReturnType<typeof usePriceBookDraft>;
