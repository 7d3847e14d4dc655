import { readFileSync } from 'node:fs';
import { woffToSfnt } from './woff-to-sfnt';

/**
 * The shipped Inter font for the PDF. @fontsource splits Inter into script subsets (latin, latin-ext,
 * cyrillic, …) and pdfkit has no font fallback, so text is written in runs, each in the first subset
 * whose declared range holds its characters: "Łukasz O’Brien" is one run of latin-ext ("Ł") and one of
 * latin. The .woff files are used because pdfkit (fontkit) cannot read woff2.
 */

export type InterWeight = 400 | 600 | 700;

/** Tried in this order; latin first, as nearly all text is latin. */
const SUBSETS = [
  'latin',
  'latin-ext',
  'vietnamese',
  'greek',
  'greek-ext',
  'cyrillic',
  'cyrillic-ext',
] as const;
export type InterSubset = (typeof SUBSETS)[number];

type CodePointRange = { from: number; to: number };

let subsetRanges: Array<{ subset: InterSubset; ranges: CodePointRange[] }> | null = null;
const fontFiles = new Map<string, Buffer>();

/** "U+0000-00FF,U+0131" → ranges, from the package's own unicode.json (the subsets' coverage). */
function parseRanges(text: string): CodePointRange[] {
  return text.split(',').map((part) => {
    const [from, to] = part.trim().replace(/^U\+/i, '').split('-');
    const start = parseInt(from!, 16);
    return { from: start, to: to === undefined ? start : parseInt(to, 16) };
  });
}

function rangesBySubset(): Array<{ subset: InterSubset; ranges: CodePointRange[] }> {
  if (!subsetRanges) {
    const declared = JSON.parse(
      readFileSync(require.resolve('@fontsource/inter/unicode.json'), 'utf8'),
    ) as Record<string, string>;
    subsetRanges = SUBSETS.filter((subset) => declared[subset]).map((subset) => ({
      subset,
      ranges: parseRanges(declared[subset]!),
    }));
  }
  return subsetRanges;
}

/** The subset that covers a character; latin for anything Inter lacks (it prints as a blank box). */
export function subsetFor(codePoint: number): InterSubset {
  for (const { subset, ranges } of rangesBySubset()) {
    if (ranges.some((range) => codePoint >= range.from && codePoint <= range.to)) return subset;
  }
  return 'latin';
}

/** The text split into runs of one subset each, in order. */
export function splitIntoSubsetRuns(text: string): Array<{ subset: InterSubset; text: string }> {
  const runs: Array<{ subset: InterSubset; text: string }> = [];
  for (const character of text) {
    // Spaces and line breaks stay with the run they are in, so words are never split oddly.
    const subset =
      /\s/.test(character) && runs.length > 0
        ? runs[runs.length - 1]!.subset
        : subsetFor(character.codePointAt(0)!);
    const last = runs[runs.length - 1];
    if (last && last.subset === subset) last.text += character;
    else runs.push({ subset, text: character });
  }
  return runs;
}

/**
 * Inter's substitutions (GSUB: contextual alternates such as "->" turning into an arrow, case forms)
 * are left out: the quote needs none of them, and fontkit parses them again for every document,
 * which made a render three to four times slower. Kerning (GPOS) stays.
 */
const UNUSED_TABLES = ['GSUB'];

/** The font, unpacked from its .woff file once per process (see `woffToSfnt`). */
export function interFontFile(subset: InterSubset, weight: InterWeight): Buffer {
  const key = `${subset}-${weight}`;
  let bytes = fontFiles.get(key);
  if (!bytes) {
    const woff = readFileSync(
      require.resolve(`@fontsource/inter/files/inter-${subset}-${weight}-normal.woff`),
    );
    bytes = woffToSfnt(woff, UNUSED_TABLES);
    fontFiles.set(key, bytes);
  }
  return bytes;
}
