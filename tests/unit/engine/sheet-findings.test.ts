import { describe, expect, it } from 'vitest';
import { analyseSheet } from '@/lib/engine/analyse-sheet';
import type { WindingSheet } from '@/lib/as-found/winding-sheet-schema';
import { expectedGroups, RESISTANCE_AGREEMENT_PERCENT, sheetFindings } from '@/lib/engine/sheet-findings';
import { EXAMPLE_A_SHEET, value } from '../../support/fixtures/winding-fixtures';

const findings = (s: WindingSheet) => sheetFindings(s, value(analyseSheet(s)));
const ids = (s: WindingSheet) => findings(s).map((f) => f.id);

/** 36 slots, 4 poles, single-layer concentric half-coiled, spans 11/9/7 (usual τ+q−1, −2 …) [derived, docs/engineering/winding-factor.md]. */
const CONCENTRIC: WindingSheet = {
  ...EXAMPLE_A_SHEET,
  winding: {
    layers: 1,
    style: 'concentric',
    singleLayerCoiling: 'half',
    spans: [11, 9, 7],
    turnsPerCoil: [28, 28, 28],
    parallelPaths: 1,
    connection: 'star',
    coilsPerGroup: 3,
    groups: 6,
  },
  resistance: undefined,
};

describe('consistency checks of an as-found sheet', () => {
  it('finds nothing wrong with worked example A (docs/engineering/flux-density.md and wire-and-resistance.md)', () => {
    expect(findings(EXAMPLE_A_SHEET)).toEqual([]);
  });

  // Groups: 3P, or 3P/2 single-layer half-coiled [common practice]. (Coil counts come from the engine's layout.)
  it.each([
    [4, 2, undefined, 12],
    [4, 1, 'half', 6],
    [4, 1, 'whole', 12],
    [6, 2, undefined, 18],
  ] as const)('%s poles, %s layer(s), %s coiling → %s groups', (poles, layers, coiling, groups) =>
    expect(expectedGroups(poles, layers, coiling)).toBe(groups),
  );

  it('accepts a counted single-layer concentric winding whose groups and coils agree', () => {
    expect(ids(CONCENTRIC)).toEqual([]);
  });

  it('flags groups that do not match the poles and a coil count that does not match the slots', () => {
    const s = { ...CONCENTRIC, winding: { ...CONCENTRIC.winding, groups: 12 } };
    expect(ids(s)).toEqual(expect.arrayContaining(['coil-count', 'groups-poles']));
    expect(findings(s).every((f) => f.check.length > 10)).toBe(true);
  });

  it('flags coils per group that disagree with the concentric spans', () => {
    expect(ids({ ...CONCENTRIC, winding: { ...CONCENTRIC.winding, coilsPerGroup: 2, groups: 9 } })).toContain('coils-per-group');
  });

  // docs/engineering/redesign.md: single-layer half-coiled allows a dividing P/2 → 1, 2 for 4 poles [derived].
  it('flags parallel circuits the layout cannot have and names the possible ones', () => {
    const f = findings({ ...CONCENTRIC, winding: { ...CONCENTRIC.winding, parallelPaths: 4 } }).find((x) => x.id === 'parallel-paths');
    expect(f?.severity).toBe('problem');
    expect(f?.message).toMatch(/Possible: 1, 2\./);
  });

  // Resistance ∝ turns at fixed wire and MLT (docs/engineering/wire-and-resistance.md): 20 % high readings imply 14 × 1.2 ≈ 17 turns.
  it('flags turns that disagree with the measured resistance, with the turns the readings imply', () => {
    const r = EXAMPLE_A_SHEET.resistance!;
    const s = { ...EXAMPLE_A_SHEET, resistance: { ...r, readings: r.readings.map((x) => x * 1.2) as [number, number, number] } };
    const f = findings(s).find((x) => x.id === 'resistance-turns');
    expect(f?.message).toMatch(/about 17 turns per coil, not 14/);
    expect(RESISTANCE_AGREEMENT_PERCENT).toBe(10);
  });

  it('stays quiet when the readings agree within the configured agreement', () => {
    const r = EXAMPLE_A_SHEET.resistance!;
    const s = { ...EXAMPLE_A_SHEET, resistance: { ...r, readings: r.readings.map((x) => x * 1.08) as [number, number, number] } };
    expect(ids(s)).not.toContain('resistance-turns');
    expect(sheetFindings(s, value(analyseSheet(s)), { resistanceAgreementPercent: 5 }).map((f) => f.id)).toContain('resistance-turns');
  });

  it('notes an unusual lead count and a copper weight far from the turns and wire', () => {
    // Example A copper: 36 coils × 14 turns × 0.56 m × 1.135 mm² × 8890 kg/m³ ≈ 2.85 kg (IEC 60028 density) [derived].
    const s = { ...EXAMPLE_A_SHEET, winding: { ...EXAMPLE_A_SHEET.winding, leads: 5, copperWeightKg: 5 } };
    expect(ids(s)).toEqual(expect.arrayContaining(['leads', 'copper-weight']));
    expect(ids({ ...s, winding: { ...s.winding, leads: 6, copperWeightKg: 3 } })).toEqual([]);
  });

  it('reports flux too high for the supply with the limit it used', () => {
    // Half the turns doubles the flux per pole: yoke 2 × 1.2045 T (docs/engineering/flux-density.md) is above 1.7 T.
    const s = { ...EXAMPLE_A_SHEET, winding: { ...EXAMPLE_A_SHEET.winding, turnsPerCoil: [7] }, resistance: undefined };
    const f = findings(s);
    expect(f.map((x) => x.id)).toEqual(expect.arrayContaining(['flux-yoke', 'flux-tooth']));
    expect(f[0]?.severity).toBe('problem');
  });

  it('lists problems before checks before notes', () => {
    const s = { ...CONCENTRIC, winding: { ...CONCENTRIC.winding, parallelPaths: 4, leads: 5 } };
    const sev = findings(s).map((f) => f.severity);
    expect(sev).toEqual([...sev].sort((a, b) => ['problem', 'check', 'note'].indexOf(a) - ['problem', 'check', 'note'].indexOf(b)));
  });
});
