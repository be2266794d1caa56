/**
 * The shop's own details printed at the top of the job sheet, from COILWRIGHT_SHOP_NAME, _ADDRESS and
 * _PHONE (checked in lib/env.ts). Without a name the sheet says what the shop does rather than inventing one.
 */
import { env, type Env } from '@/lib/env';

export interface ShopDetails {
  name: string;
  address: string | null;
  phone: string | null;
}

export const UNNAMED_SHOP = 'Electric motor repair';

export function shopDetails(e: Env = env()): ShopDetails {
  return {
    name: e.COILWRIGHT_SHOP_NAME ?? UNNAMED_SHOP,
    address: e.COILWRIGHT_SHOP_ADDRESS ?? null,
    phone: e.COILWRIGHT_SHOP_PHONE ?? null,
  };
}
