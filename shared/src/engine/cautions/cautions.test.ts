import { describe, expect, it } from 'vitest';
import { typicalPond } from '../fixtures/sample-inputs';
import { computeFullTakeoff as computeTakeoff } from '../testing/full-engine';
import type { TakeoffInput } from '../schemas/takeoff-input';

const codesOf = (input: TakeoffInput) => {
  const r = computeTakeoff(input);
  if (!r.ok) throw new Error(JSON.stringify(r.errors));
  return r.takeoff.cautions;
};

describe('cautions and warnings', () => {
  it('always defers to local code and professionals for digging, water depth and electricity', () => {
    const c = codesOf(typicalPond());
    const byCode = Object.fromEntries(c.map((x) => [x.code, x]));
    // TRADE.md cautions; REFERENCES 7.10 (811), 7.5–7.8 (GFCI)
    expect(byCode['utility-locates']!.message).toContain('811');
    expect(byCode['utility-locates']!.message).toContain('Private lines');
    expect(byCode['gfci']!.message).toContain('licensed electrician');
    expect(byCode['barrier-depth']!.message).toContain('local code');
    expect(byCode['barrier-depth']!.field).toBe('basins.0.maxDepthFt');
    expect(byCode['heavy-stone']).toBeDefined();
  });

  it('flags excavations of 5 ft and deeper', () => {
    // TRADE.md: a protective system is required at 5 ft and deeper in the US
    const pond = typicalPond();
    const deep = {
      ...pond,
      basins: [
        {
          ...pond.basins[0]!,
          outline: { shape: 'rectangle' as const, lengthFt: 20, widthFt: 14 },
          maxDepthFt: 5,
        },
      ],
    };
    expect(codesOf(deep).map((x) => x.code)).toContain('excavation-protective-system');
    expect(codesOf(pond).map((x) => x.code)).not.toContain('excavation-protective-system');
  });

  it('warns when no pump reaches the flow at the head', () => {
    const pond = typicalPond();
    const c = codesOf({ ...pond, pumpRun: { ...pond.pumpRun!, elevationFt: 40 } });
    expect(c.find((x) => x.code === 'no-pump-reaches-flow')?.severity).toBe('warning');
  });

  it('warns when the velocity is too high in a pipe given too small', () => {
    // 2400 gph = 40 gpm in 1-in pipe: 0.4085 × 40 / 1.049² = 14.8 ft/s > 5 ft/s (REFERENCES 5.6, 5.7)
    const pond = typicalPond();
    const c = codesOf({
      ...pond,
      pumpRun: { ...pond.pumpRun!, pressurePipeSizeIn: 1, elevationFt: 1, pressurePipeLengthFt: 5 },
    });
    expect(c.map((x) => x.code)).toContain('velocity-high-pressure');
  });

  it('warns when the last fixture gets too little voltage, and when a run carries over 25 A', () => {
    // 12 × 25 W = 300 W = 25 A... use 14 × 25 W = 350 W = 29.2 A > 25 A (NEC 411, REFERENCES 7.4);
    // on 100 ft of 16 AWG the drop is far beyond 1.5 V (REFERENCES 7.1–7.2)
    const c = codesOf(
      typicalPond({
        lighting: [
          { cableLengthFt: 100, gaugeAwg: '16', fixtureWatts: Array<number>(14).fill(25) },
        ],
      }),
    );
    const codes = c.map((x) => x.code);
    expect(codes).toContain('fixture-voltage-low');
    expect(codes).toContain('lighting-circuit-current-high');
  });
});
