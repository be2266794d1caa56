/**
 * The CI variant of `npm run soak`: 10 clients for 30 s on the production build against PostgreSQL, with
 * NO database restart (restarting the PostgreSQL server CI shares with other jobs is not safe). Checks
 * acknowledged writes, gap-free numbers, hold states, and no 5xx.
 */
import { describe, expect, it } from 'vitest';
import { soak } from '../../scripts/soak';

const ON_POSTGRES = Boolean(process.env.TEST_DATABASE_URL);

describe.skipIf(!ON_POSTGRES)('short soak (no restart)', () => {
  it('10 clients for 30 s: no 5xx, nothing acknowledged lost or doubled, numbers gap-free', async () => {
    process.env.SOAK_DATABASE_URL ??= process.env.TEST_DATABASE_URL;
    const r = await soak({ clients: 10, seconds: 30, restartDb: false });
    console.log(JSON.stringify(r, null, 1));
    expect(r.problems).toEqual([]);
    expect(r.fiveHundreds).toBe(0);
    expect(r.requests).toBeGreaterThan(50);
    expect(r.perKind.intake?.n ?? 0).toBeGreaterThan(0);
    expect((r.perKind.intake?.n ?? 0) - (r.perKind.intake?.failed ?? 0)).toBeGreaterThan(0);
  }, 900_000);
});
