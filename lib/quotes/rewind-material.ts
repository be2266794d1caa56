/**
 * The rewind material lines of an estimate, from the copper the winding to be wound needs (engine:
 * windingCopper → copperMassKg): magnet wire per size with the shop's copper allowance, priced per kg,
 * then insulation and varnish as the shop's shares of the copper cost. Pure; rewind-source.ts picks the
 * winding (approved redesign, else the as-found sheet).
 */
import type { WindingCopper } from '@/lib/engine/winding-copper';
import type { CommercialSettings } from '@/lib/settings/commercial-defaults';
import { basisPointsToPercent, formatScaledShort } from './decimal-input';
import { sumMinor, timesBasisPoints, timesMilli } from './money';
import type { EstimateLine } from './quote-schema';

/**
 * Wire to buy, grams, rounded UP: the winder needs at least this much on the bench. This is the one place a
 * float (the engine's kg) becomes a stored quantity.
 */
export const kgToBuyMilli = (copperKg: number, allowanceBp: number): number =>
  Math.ceil(copperKg * (1 + allowanceBp / 10_000) * 1000 - 1e-9);

export function rewindMaterialLines(copper: WindingCopper, source: string, s: CommercialSettings): EstimateLine[] {
  const wire: EstimateLine[] = copper.lines.map((l) => ({
    kind: 'REWIND',
    description: `Magnet wire ${l.label}, ${l.count} in hand: ${formatScaledShort(Math.round(l.copperKg * 1000), 3)} kg in the winding + ${basisPointsToPercent(s.copperAllowanceBp)} % for leads and waste`,
    reference: source,
    quantityMilli: kgToBuyMilli(l.copperKg, s.copperAllowanceBp),
    unit: 'kg',
    unitPriceMinor: s.copperPricePerKgMinor,
    taxRateBp: s.defaultTaxRateBp,
  }));
  const copperCost = sumMinor(
    wire.map((l) => timesMilli(l.unitPriceMinor, l.quantityMilli, s.currency)),
    s.currency,
  );
  const share = (bp: number, description: string): EstimateLine[] =>
    bp > 0
      ? [
          {
            kind: 'REWIND',
            description: `${description}: ${basisPointsToPercent(bp)} % of the copper`,
            reference: source,
            quantityMilli: 1000,
            unit: 'lot',
            unitPriceMinor: timesBasisPoints(copperCost, bp, s.currency),
            taxRateBp: s.defaultTaxRateBp,
          },
        ]
      : [];
  return [
    ...wire,
    ...share(s.insulationAllowanceBp, 'Insulation (slot liners, wedges, sleeving, ties)'),
    ...share(s.varnishAllowanceBp, 'Varnish and resin'),
  ];
}
