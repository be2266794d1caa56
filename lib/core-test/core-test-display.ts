/**
 * Metric-and-imperial text for the core-loss figures (screen, print view and PDF share these).
 */
import { KG_PER_LB, kgToLb, mmToInches, teslaToKilolinesPerIn2 } from '@/lib/engine/units';
import { fmt } from '@/lib/presentation/format';

const MM2_PER_IN2 = 25.4 * 25.4;

export const coreText = {
  mm: (mm: number, d = 1) => `${fmt.num(mm, d, 'mm')} (${fmt.num(mmToInches(mm), d + 2, 'in')})`,
  mm2: (mm2: number) => `${fmt.num(mm2, 0, 'mm²')} (${fmt.num(mm2 / MM2_PER_IN2, 2, 'in²')})`,
  kg: (kg: number) => `${fmt.num(kg, 2, 'kg')} (${fmt.num(kgToLb(kg), 1, 'lb')})`,
  tesla: (t: number) => `${fmt.num(t, 3, 'T')} (${fmt.num(teslaToKilolinesPerIn2(t), 1, 'kilolines/in²')})`,
  wPerKg: (w: number) => `${fmt.num(w, 3, 'W/kg')} (${fmt.num(w * KG_PER_LB, 3, 'W/lb')})`,
  riseK: (k: number) => `${fmt.num(k, 1, 'K')} (${fmt.num(k * 1.8, 1, '°F')})`,
  pct: (f: number) => `${f >= 0 ? '+' : '−'}${fmt.num(Math.abs(f * 100), 1, '%')}`,
};
