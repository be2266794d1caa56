/**
 * The demo shop's wire stock and settings (invented): metric enamelled copper 0.40–1.60 mm on the R40
 * series, grade 2, and AWG 14–22 heavy build, with made-up quantities; the shop settings row with the
 * documented default limits.
 */
import type { Prisma } from '@/lib/db/generated/client';
import { DEFAULT_REDESIGN_LIMITS, stockWire } from '@/lib/engine/redesign/from-sheet';
import { listAwgSizes, listMetricSizes } from '@/lib/engine/wire';

/** 25 metric sizes and 9 AWG sizes. */
export const DEMO_STOCK = [
  ...listMetricSizes()
    .filter((w) => w.bareMm >= 0.4 && w.bareMm <= 1.6)
    .map((w) => ({ standard: 'metric' as const, size: w.size })),
  ...listAwgSizes()
    .filter((w) => w.n >= 14 && w.n <= 22)
    .map((w) => ({ standard: 'awg' as const, size: w.size })),
];

/** Idempotent: a table that already has rows is left alone (a re-run completes a half-done seed). */
export async function seedStock(prisma: Prisma.TransactionClient): Promise<void> {
  if ((await prisma.wireStock.count()) === 0) await seedWires(prisma);
  if ((await prisma.shopSettings.count()) === 0) await seedSettings(prisma);
}

async function seedWires(prisma: Prisma.TransactionClient): Promise<void> {
  for (const [i, w] of DEMO_STOCK.entries()) {
    const found = stockWire({ ...w, enamelGrade: 2 });
    if (!found.ok) throw new Error(`demo stock: ${found.error.message}`);
    await prisma.wireStock.create({
      data: {
        standard: w.standard,
        size: found.value.size,
        enamelGrade: 2,
        bareMm: found.value.bareMm,
        quantityKg: 5 + ((i * 7) % 23),
        note: i % 9 === 4 ? 'Last reel: reorder' : null,
      },
    });
  }
}

async function seedSettings(prisma: Prisma.TransactionClient): Promise<void> {
  const l = DEFAULT_REDESIGN_LIMITS;
  await prisma.shopSettings.create({
    data: {
      fluxGapRise: l.gap.over,
      fluxGapFall: l.gap.under,
      fluxToothRise: l.tooth.over,
      fluxToothFall: l.tooth.under,
      fluxYokeRise: l.yoke.over,
      fluxYokeFall: l.yoke.under,
      currentDensityRise: l.currentDensityRise,
      currentDensityMaxAPerMm2: l.currentDensityMaxAPerMm2,
      slotFillMax: l.slotFillMax,
      maxStrandsInHand: l.maxStrandsInHand,
      maxWireSizes: l.maxWireSizes,
      mixedSizeRatioMax: l.mixedSizeRatioMax,
      minWireBareMm: l.minWireBareMm,
      harmonicKwMax: l.harmonicKwMax,
    },
  });
}
