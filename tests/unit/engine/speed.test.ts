import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { POLES_FROM_SPEED_MESSAGES, polesFromSpeed, slip, synchronousSpeedRpm, torqueNm, torqueNmFromHp } from '@/lib/engine/speed';

describe('speed and poles', () => {
  // docs/engineering/nameplate-and-speed.md check values.
  it.each([
    { hz: 60, rpm: 1750, poles: 4, slipPercent: '2.78' },
    { hz: 50, rpm: 965, poles: 6, slipPercent: '3.50' },
  ])('$hz Hz at $rpm rpm is $poles poles with $slipPercent % slip', ({ hz, rpm, poles, slipPercent }) => {
    const p = polesFromSpeed(hz, rpm);
    expect(p).toEqual({ ok: true, value: poles });
    expect((slip(synchronousSpeedRpm(hz, poles), rpm) * 100).toFixed(2)).toBe(slipPercent);
  });

  it.each([
    [60, 2, 3600],
    [60, 4, 1800],
    [50, 6, 1000],
    [50, 8, 750],
  ])('synchronous speed at %i Hz, %i poles is %i rpm', (hz, poles, rpm) => {
    expect(synchronousSpeedRpm(hz, poles)).toBeCloseTo(rpm, 9);
  });

  it('reads an exactly synchronous speed as its own pole count', () => {
    expect(polesFromSpeed(50, 1500)).toEqual({ ok: true, value: 4 });
    expect(polesFromSpeed(60, 3600)).toEqual({ ok: true, value: 2 });
  });

  it.each([
    { hz: 0, rpm: 1750, message: POLES_FROM_SPEED_MESSAGES.invalid },
    { hz: 60, rpm: -1, message: POLES_FROM_SPEED_MESSAGES.invalid },
    { hz: 60, rpm: 3700, message: POLES_FROM_SPEED_MESSAGES.tooFast },
    { hz: 60, rpm: 1400, message: POLES_FROM_SPEED_MESSAGES.slipTooHigh },
    { hz: 50, rpm: 1, message: POLES_FROM_SPEED_MESSAGES.tooSlow },
  ])('refuses $hz Hz at $rpm rpm', ({ hz, rpm, message }) => {
    const r = polesFromSpeed(hz, rpm);
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.error.message).toBe(message);
  });

  it('recovers the pole count of any motor whose slip is below both 10 % and 1/(p + 1)', () => {
    // The floor formula holds while n > 120·f/(P + 2), i.e. s < 1/(p + 1) [derived].
    fc.assert(
      fc.property(
        fc.constantFrom(50, 60),
        fc.integer({ min: 1, max: 12 }),
        fc.double({ min: 0, max: 0.999, noNaN: true }),
        (hz, pairs, u) => {
          const s = u * Math.min(0.1, 1 / (pairs + 1));
          expect(polesFromSpeed(hz, ((60 * hz) / pairs) * (1 - s))).toEqual({ ok: true, value: 2 * pairs });
        },
      ),
    );
  });
});

describe('torque', () => {
  it.each([
    [7.5, 1450],
    [30, 1475],
    [0.75, 2850],
  ])('%f kW at %i rpm is 9549·P/n N·m', (kw, rpm) => {
    // docs/engineering/nameplate-and-speed.md: T = 9549·P[kW]/n; independently P/ω = 1000·P/(2π·n/60).
    expect(torqueNm(kw, rpm)).toBeCloseTo((1000 * kw) / ((2 * Math.PI * rpm) / 60), 9);
    expect(Math.abs(torqueNm(kw, rpm) / ((9549 * kw) / rpm) - 1)).toBeLessThan(5e-5);
  });

  it('converts horsepower at 745.7 W', () => {
    expect(torqueNmFromHp(10, 1750)).toBeCloseTo((7457 * 60) / (2 * Math.PI * 1750), 9);
  });
});
