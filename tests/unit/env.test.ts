import { describe, expect, it } from 'vitest';
import { readEnv } from '@/lib/env';
import { readDbConfig } from '@/lib/db/config';

describe('the environment settings', () => {
  it('treat blank values as unset and fill the defaults', () => {
    const e = readEnv({ DATABASE_URL: '', COILWRIGHT_SHOP_NAME: '  ' });
    expect(e.DATABASE_URL).toBeUndefined();
    expect(e.COILWRIGHT_SHOP_NAME).toBeUndefined();
    expect(e.COILWRIGHT_DATA_DIR).toBe('./data/pglite');
    expect(readDbConfig(e)).toEqual({ engine: 'pglite', dataDir: './data/pglite' });
  });

  it('choose PostgreSQL when DATABASE_URL is set', () => {
    const e = readEnv({ DATABASE_URL: 'postgresql://u@127.0.0.1:5432/shop' });
    expect(readDbConfig(e)).toEqual({ engine: 'postgres', url: 'postgresql://u@127.0.0.1:5432/shop' });
  });

  it('refuse a bad value naming the variable', () => {
    expect(() => readEnv({ COILWRIGHT_SEED_DEMO: 'yes' })).toThrow(/COILWRIGHT_SEED_DEMO/);
    expect(() => readEnv({ DATABASE_URL: 'not a url' })).toThrow(/DATABASE_URL/);
  });

  it('normalise the first administrator email', () => {
    expect(readEnv({ COILWRIGHT_ADMIN_EMAIL: ' Boss@Example.COM ' }).COILWRIGHT_ADMIN_EMAIL).toBe('boss@example.com');
  });
});
