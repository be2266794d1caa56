/**
 * The shop's own details printed at the top of the job sheet, from the environment (checked with zod):
 * COILWRIGHT_SHOP_NAME, COILWRIGHT_SHOP_ADDRESS, COILWRIGHT_SHOP_PHONE. Without them the invented demo
 * shop's name is used, so a fresh install prints something sensible.
 */
import { z } from 'zod';
import { DEMO_SHOP_NAME } from '@/lib/setup/demo/demo-data';

export interface ShopDetails {
  name: string;
  address: string | null;
  phone: string | null;
}

const text = z.string().trim().max(200).optional().catch(undefined);
const envSchema = z.object({ COILWRIGHT_SHOP_NAME: text, COILWRIGHT_SHOP_ADDRESS: text, COILWRIGHT_SHOP_PHONE: text });

export function shopDetails(env: NodeJS.ProcessEnv = process.env): ShopDetails {
  const e = envSchema.parse(env);
  return { name: e.COILWRIGHT_SHOP_NAME || DEMO_SHOP_NAME, address: e.COILWRIGHT_SHOP_ADDRESS || null, phone: e.COILWRIGHT_SHOP_PHONE || null };
}
