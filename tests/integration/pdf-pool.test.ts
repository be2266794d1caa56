import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { monitorEventLoopDelay } from 'node:perf_hooks';
import { GET } from '@/app/jobs/[number]/job-sheet/pdf/route';
import { db } from '@/lib/db/client';
import { clearPdfCache } from '@/lib/job-sheet/pdf-cache';
import { closePdfPool, poolStats } from '@/lib/job-sheet/pdf-pool';
import { useTestDatabase } from '../support/test-db';
import { actAs } from '../support/session';
import { FRONT_DESK } from '../support/demo-users';
import { pdfText } from '../support/pdf-text';

useTestDatabase();

let number = 0;
const download = async () => {
  const res = await GET(new Request(`http://x/jobs/${number}/job-sheet/pdf`), { params: Promise.resolve({ number: String(number) }) });
  expect(res.status).toBe(200);
  return { source: res.headers.get('X-Job-Sheet-Source'), bytes: new Uint8Array(await res.arrayBuffer()) };
};

beforeAll(async () => {
  number = (await db().job.findFirstOrThrow({ where: { isOpen: true }, orderBy: { number: 'asc' } })).number;
  await actAs(FRONT_DESK.email);
  clearPdfCache();
});
afterAll(() => closePdfPool());

describe('job sheet PDFs render on worker threads, once per issue of the record', () => {
  it('renders the first download on a worker while the request thread keeps answering', async () => {
    const before = poolStats().rendered;
    const delay = monitorEventLoopDelay({ resolution: 10 });
    delay.enable();
    const first = await download();
    delay.disable();
    expect(first.source).toBe('generated');
    expect(pdfText(Buffer.from(first.bytes))).toContain(`${number}`);
    expect(poolStats().rendered).toBe(before + 1);
    expect(poolStats().workers).toBeGreaterThanOrEqual(1);
    // The render itself takes hundreds of ms of CPU; none of it blocks this thread for long.
    expect(delay.max / 1e6).toBeLessThan(1000);
  }, 60_000);

  it('serves the same issue from the cache, byte for byte, without another render', async () => {
    const before = poolStats().rendered;
    const a = await download();
    const b = await download();
    expect([a.source, b.source]).toEqual(['cached', 'cached']);
    expect(Buffer.from(a.bytes).equals(Buffer.from(b.bytes))).toBe(true);
    expect(poolStats().rendered).toBe(before);
  });

  it('renders again once the record changes, and the new sheet says what changed', async () => {
    await db().job.update({ where: { number }, data: { customerPo: 'PO-CACHE-7731' } });
    const after = await download();
    expect(after.source).toBe('generated');
    expect(pdfText(Buffer.from(after.bytes))).toContain('PO-CACHE-7731');
  }, 60_000);

  it('shares one render between downloads of the same issue that arrive together', async () => {
    await db().job.update({ where: { number }, data: { customerPo: 'PO-CACHE-7732' } });
    const before = poolStats().rendered;
    const all = await Promise.all([download(), download(), download()]);
    expect(poolStats().rendered).toBe(before + 1);
    expect(new Set(all.map((x) => x.bytes.byteLength)).size).toBe(1);
  }, 60_000);
});
