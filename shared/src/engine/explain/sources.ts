import type { ExplanationSource } from './explanation';

/** Sources cited in explanations, with the label used in docs/references.md. */
export const SRC = {
  galPerCuFt: {
    name: 'US gal per ft³',
    value: '1728/231 = 7.480519',
    source: 'NIST Handbook 44, App. C (1 gal = 231 in³ exactly)',
  },
  cuFtPerCuYd: { name: 'ft³ per yd³', value: '27', source: 'NIST Handbook 44, App. C (exact)' },
  lbPerTon: { name: 'lb per short ton', value: '2000', source: 'NIST Handbook 44, App. C (exact)' },
  prismoidal: {
    name: 'prismoidal formula',
    value: 'h/6 · (A_top + 4·A_mid + A_bot), written with dA/dt = −P',
    source: 'standard earthwork formula (REFERENCES 2.5)',
  },
  linerRule: {
    name: 'liner rule',
    value: 'dimension + 2 × max depth + 2 × overlap',
    source: 'common practice, no source (REFERENCES 3.1)',
  },
  streamLinerRule: {
    name: 'stream liner rule',
    value: 'dimension + 2 × drop + allowance',
    source: 'common practice, no source (REFERENCES 3.6)',
  },
  stock: {
    name: 'stock sheet sizes',
    value: 'widths and length step from the price book',
    source: 'common practice (REFERENCES 3.3)',
  },
  underlayment: {
    name: 'underlayment',
    value: 'same size as the liner',
    source: 'common practice, no source (REFERENCES 3.2)',
  },
  linerWeight: {
    name: 'liner weight',
    value: 'lb per ft²',
    source: 'derived, 45-mil EPDM (REFERENCES 3.5)',
  },
  swell: {
    name: 'swell factor',
    value: 'loose / bank',
    source: 'US Army FM 5-434, Table 1-2 (REFERENCES 6.5)',
  },
  bankDensity: {
    name: 'bank density',
    value: 'lb/ft³ by soil',
    source: 'quarry table / ASCE 7 Table C3-2 (REFERENCES 6.4)',
  },
  stoneDensity: {
    name: 'stone density',
    value: 'lb/ft³',
    source: 'ASCE 7 commentary Table C3-2, from memory (REFERENCES 6.2)',
  },
  shapeFactor: {
    name: 'boulder shape factor',
    value: 'share of the bounding cube',
    source: 'derived (REFERENCES 9.7)',
  },
  boulderSizes: {
    name: 'boulder sizes',
    value: 'small/medium/large nominal sizes',
    source: 'common practice, no source',
  },
  gravelBulk: {
    name: 'gravel bulk density',
    value: 'short tons per yd³',
    source: 'quarry weights table (REFERENCES 6.3)',
  },
  gravelVoids: {
    name: 'gravel voids',
    value: '1 − bulk density / solid density',
    source: 'derived from REFERENCES 6.2 and 6.3',
  },
  turnover: {
    name: 'turnover',
    value: 'pond volume per hour × turnovers',
    source: 'common practice, no source (REFERENCES 4.1)',
  },
  weir: {
    name: 'weir flow',
    value: 'gph per inch of weir by sheet',
    source: 'trade publication; common practice (REFERENCES 4.2)',
  },
  hazenWilliams: {
    name: 'Hazen–Williams',
    value: 'h/100 ft = 1044 (Q/C)^1.852 / d^4.8655',
    source: 'NFPA 13 form (REFERENCES 5.1)',
  },
  pipeId: {
    name: 'Sch 40 PVC inside diameter',
    value: 'OD − 2 × min wall',
    source: 'ASTM D1785 (REFERENCES 5.5)',
  },
  cPvc: { name: 'C for PVC', value: '150', source: 'NFPA 13 C-factor table (REFERENCES 5.3)' },
  fittings: {
    name: 'fitting equivalent lengths',
    value: 'Sch 40 steel, C = 120, × (C/120)^1.852',
    source: 'NFPA 13 equivalent length chart (REFERENCES 5.9)',
  },
  velocity: { name: 'velocity', value: 'V = 0.4085 Q / d²', source: 'derived (REFERENCES 5.6)' },
  velocityLimit: {
    name: 'velocity limits',
    value: 'pressure and suction side',
    source: 'REFERENCES 5.7, 5.8',
  },
  whp: {
    name: 'water horsepower',
    value: 'Q[gpm] × H[ft] / 3960',
    source: 'standard (REFERENCES 4.6)',
  },
  pumpCurves: {
    name: 'pump curves',
    value: 'catalogue points, linear interpolation',
    source: 'price book (defaults are demo data)',
  },
  necTable8: {
    name: 'conductor resistance',
    value: 'Ω per 1000 ft, stranded copper, 75 °C',
    source: 'NFPA 70 (NEC) Chapter 9, Table 8 (REFERENCES 7.1)',
  },
  voltageDrop: {
    name: 'two-wire voltage drop',
    value: 'VD = 2 · L · I · R / 1000',
    source: 'standard formula (REFERENCES 7.2)',
  },
  transformerLoad: {
    name: 'transformer loading',
    value: 'load ≤ 80 % of rating',
    source: 'common practice, no source (REFERENCES 7.3)',
  },
  handDig: {
    name: 'hand digging rate',
    value: 'labor-h per bank yd³ by soil',
    source: 'labour-factor directory (REFERENCES 8.1)',
  },
  handLoad: {
    name: 'hand loading and wheeling',
    value: 'labor-h per yd³',
    source: 'labour-factor directory (REFERENCES 8.2)',
  },
  machineDig: {
    name: 'machine digging',
    value: 'bank yd³ per hour + trimming',
    source: 'secondary; common practice (REFERENCES 8.3)',
  },
  boulderRate: {
    name: 'boulder placing',
    value: 'labor-h per ton',
    source: 'from memory / common practice, low confidence (REFERENCES 8.4)',
  },
  gravelRate: {
    name: 'gravel spreading',
    value: 'labor-h per ton',
    source: 'anecdote, low confidence (REFERENCES 8.5)',
  },
  workingDefault: {
    name: 'production rate',
    value: 'price book',
    source: 'Pondwright working default, no source: calibrate from job history',
  },
  siteFactors: {
    name: 'slope and carry factors',
    value: 'price book',
    source: 'common practice, no source',
  },
  drainBack: {
    name: 'stream running depth',
    value: 'in of moving water',
    source: 'common practice, no source',
  },
  reservoirFactor: {
    name: 'reservoir safety factor',
    value: 'required ÷ drain-back',
    source: 'common practice, no source',
  },
  blockVoids: {
    name: 'water storage block voids',
    value: 'open share of a block',
    source: 'common practice, no source',
  },
} satisfies Record<string, ExplanationSource>;
