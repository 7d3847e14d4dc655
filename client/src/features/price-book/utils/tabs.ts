export const PRICE_BOOK_TABS = [
  { value: 'materials', label: 'Materials', section: 'materials' },
  { value: 'labor', label: 'Labor', section: 'laborRoles' },
  { value: 'equipment', label: 'Equipment', section: 'equipment' },
  { value: 'disposal', label: 'Disposal', section: 'disposal' },
  { value: 'rates', label: 'Production rates', section: 'productionRates' },
  { value: 'settings', label: 'Job settings', section: 'settings' },
  { value: 'policy', label: 'Policy', section: 'policy' },
  { value: 'history', label: 'History', section: null },
  { value: 'import-export', label: 'Import/Export', section: null },
] as const;

export type PriceBookTab = (typeof PRICE_BOOK_TABS)[number]['value'];

export function isPriceBookTab(value: string | undefined): value is PriceBookTab {
  return PRICE_BOOK_TABS.some((tab) => tab.value === value);
}
