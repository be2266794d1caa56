/** The core of an as-found sheet as the loop test sees it (mm → m, once). Pure: usable on the client. */
import type { CoreRing } from '@/lib/engine/core-loss/core-ring';
import { mmToM } from '@/lib/engine/units';
import type { WindingSheet } from '@/lib/as-found/winding-sheet-schema';

export function coreRingFromSheet(core: WindingSheet['core']): CoreRing {
  return {
    outsideDiameterM: mmToM(core.outsideDiameterMm),
    boreM: mmToM(core.boreMm),
    slotDepthM: mmToM(core.slotDepthMm),
    coreLengthM: mmToM(core.coreLengthMm),
    stackingFactor: core.stackingFactor,
    ventDucts: core.ventDucts ?? 0,
    ventDuctWidthM: mmToM(core.ventDuctWidthMm ?? 0),
    slots: core.slots,
    slotWidthTopM: mmToM(core.slotWidthTopMm),
    slotWidthBottomM: mmToM(core.slotWidthBottomMm),
  };
}
