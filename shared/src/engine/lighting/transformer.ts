/**
 * Smallest transformer whose rating × max load fraction carries the load. When even the largest cannot,
 * the load is split over as many of the largest as needed. W; count rounded up.
 * Source: load ≤ 80 % of rating, common practice (REFERENCES 7.3); sizes from the price book.
 */
export function chooseTransformer(
  loadWatts: number,
  sizesWatts: readonly number[],
  maxLoadFraction: number,
): {
  sizeWatts: number;
  count: number;
  loadPercent: number;
} {
  const sorted = [...sizesWatts].sort((a, b) => a - b);
  const fits = sorted.find((size) => loadWatts <= size * maxLoadFraction + 1e-9);
  if (fits !== undefined)
    return { sizeWatts: fits, count: 1, loadPercent: (loadWatts / fits) * 100 };
  const largest = sorted[sorted.length - 1]!;
  const count = Math.ceil(loadWatts / (largest * maxLoadFraction) - 1e-9);
  return { sizeWatts: largest, count, loadPercent: (loadWatts / (largest * count)) * 100 };
}
