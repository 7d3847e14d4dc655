/**
 * The quote PDF's look: Pondwright's own palette (the client theme's reed, stone and clay scales, and
 * the blues its drawings use for water) and a Letter page with generous margins. Points throughout
 * (72 pt = 1 in).
 */

export const PAGE = {
  size: 'LETTER',
  width: 612,
  height: 792,
  /** The bottom margin leaves room for the footer drawn inside it. */
  margins: { top: 60, bottom: 76, left: 62, right: 62 },
} as const;

export const CONTENT_WIDTH = PAGE.width - PAGE.margins.left - PAGE.margins.right;

export const COLORS = {
  text: '#2e2b26', // stone 9
  muted: '#787266', // stone 6
  rule: '#e2dfd8', // stone 2
  rowShade: '#f8f7f4', // stone 0
  accent: '#5d7031', // reed 7: headings, rules and emphasis
  accentDark: '#4a5927', // reed 8
  accentSoft: '#f3f5ec', // reed 0: bands behind facts and the chosen options
  accentLine: '#cbd5ad', // reed 2
  cautionEdge: '#b85a31', // clay 6: the safety box, as the app marks warnings that are not errors
  cautionFill: '#fbf1ec', // clay 0
  white: '#ffffff',
} as const;

/** The drawings' colours, the same scale steps the client's SVG drawings use. */
export const DRAWING_COLORS = {
  water: '#d0ebff', // blue 1
  waterLine: '#228be6', // blue 6
  stream: '#a5d8ff', // blue 2
  outline: '#5d7031', // reed 7
  shelf: '#87a04b', // reed 5
  weir: '#b85a31', // clay 6
  soil: '#f4ddd2', // clay 1
  liner: '#2e2b26', // stone 9
  underlayment: '#958f82', // stone 5
  gravel: '#cdc9bf', // stone 3
  rock: '#958f82', // stone 5
  rockEdge: '#5e594f', // stone 7
  dimension: '#787266', // stone 6
  text: '#45413a', // stone 8
} as const;

/** Font sizes, pt. */
export const TYPE = {
  company: 15,
  title: 20,
  heading: 12.5,
  body: 10,
  small: 8.5,
  footer: 7.5,
  drawingLabel: 7.5,
} as const;

/** Space between lines of running text, pt. */
export const LINE_GAP = 2.5;
