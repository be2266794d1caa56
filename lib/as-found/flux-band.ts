/**
 * A flux density's verdict in words with the band that verdict was judged against, so a label never
 * claims a range the value is not in (1.204 T in the back iron is in the conservative 1.2–1.5 T band, not
 * "in range · 1.4–1.7 T"). Mirrors judgeFlux in lib/engine/flux.ts.
 */
import { judgeFlux, type FluxLimit } from '@/lib/engine/flux';

const t = (v: number) => `${v} T`;
const range = (low: number, high: number) => `${low}–${high} T`;

export function fluxBandText(tesla: number, limit: FluxLimit): { verdict: string; band: string } {
  const { typical, conservative } = limit;
  switch (judgeFlux(tesla, limit)) {
    case 'high':
      return { verdict: 'HIGH', band: `above the typical ${range(typical.low, typical.high)}` };
    case 'above-conservative':
      return {
        verdict: 'above conservative',
        band: `conservative ${range(conservative!.low, conservative!.high)}; typical up to ${t(typical.high)}`,
      };
    case 'low':
      return { verdict: 'below range', band: `below ${t(Math.min(typical.low, conservative?.low ?? Infinity))}` };
    case 'ok':
      if (conservative && tesla >= conservative.low && tesla <= conservative.high)
        return { verdict: 'in the conservative range', band: range(conservative.low, conservative.high) };
      if (tesla >= typical.low) return { verdict: 'in the typical range', band: range(typical.low, typical.high) };
      return { verdict: 'in range', band: range(Math.min(typical.low, conservative?.low ?? typical.low), typical.high) };
  }
}
