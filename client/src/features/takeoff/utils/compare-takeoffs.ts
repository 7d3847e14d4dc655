import type { DisplayQuantity } from './format-quantity';
import type { Takeoff } from '@pondwright/shared/engine';

export type FigureDifference = {
  figure: string;
  label: string;
  browser: DisplayQuantity | null;
  server: DisplayQuantity | null;
};

/** Figure by figure, where the server's takeoff differs from the browser's for the same input. */
export function compareTakeoffs(browser: Takeoff, server: Takeoff) {
  const serverByFigure = new Map(server.explanations.map((e) => [e.figure, e]));
  const browserFigures = new Set(browser.explanations.map((e) => e.figure));
  const differences: FigureDifference[] = [];
  for (const mine of browser.explanations) {
    const theirs = serverByFigure.get(mine.figure);
    if (!theirs || theirs.value !== mine.value) {
      differences.push({
        figure: mine.figure,
        label: mine.label,
        browser: mine.display,
        server: theirs?.display ?? null,
      });
    }
  }
  for (const theirs of server.explanations) {
    if (!browserFigures.has(theirs.figure)) {
      differences.push({
        figure: theirs.figure,
        label: theirs.label,
        browser: null,
        server: theirs.display,
      });
    }
  }
  return { compared: browser.explanations.length, differences };
}
