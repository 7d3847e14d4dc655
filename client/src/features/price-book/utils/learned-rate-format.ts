const rateFormat = new Intl.NumberFormat('en-US', { maximumFractionDigits: 4 });

/** A production rate with its unit, e.g. "0.48 labor-hours per ton". */
export function formatRate(value: number, unit: string): string {
  return `${rateFormat.format(value)} ${unit}`;
}

/**
 * The hours ratio as the change against the quote: 1.37 reads "+37 % hours" (the crew needed more
 * hours than quoted), 0.88 reads "−12 % hours" (fewer), with a true minus sign.
 */
export function formatHoursRatio(ratio: number | null): string {
  if (ratio === null) return '';
  const percent = Math.round((ratio - 1) * 100);
  if (percent === 0) return 'As quoted';
  return `${percent > 0 ? '+' : '−'}${Math.abs(percent)} % hours`;
}
