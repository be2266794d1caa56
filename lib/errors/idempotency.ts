/**
 * Idempotency keys for creates. The browser makes a key once per form; the server claims it inside the
 * create's own transaction. A second request with the same key waits on the first one's row lock (the
 * primary key) and, once that commits, gets the first result back; if the first rolled back, the second
 * proceeds as new. So a retry after a lost reply or a server kill never makes a second job.
 */
import type { z } from 'zod';
import type { Prisma } from '@/lib/db/generated/client';
import { DomainError } from './domain-errors';

type Tx = Prisma.TransactionClient;

/** Claims the key for this transaction; returns the stored result when an earlier request already used it. */
export async function claimRequestKey<T>(tx: Tx, key: string, userId: string, action: string, shape: z.ZodType<T>): Promise<T | null> {
  const inserted = await tx.$executeRaw`
    INSERT INTO "IdempotentRequest" ("key", "userId", "action") VALUES (${key}, ${userId}, ${action})
    ON CONFLICT ("key") DO NOTHING`;
  if (inserted === 1) return null;
  const earlier = await tx.idempotentRequest.findUnique({ where: { key } });
  // A key belongs to one person and one kind of request: anything else is refused, never replayed.
  const first = shape.safeParse(earlier?.result);
  if (!earlier || earlier.userId !== userId || earlier.action !== action || !first.success) {
    throw new DomainError('conflict', 'This form was already sent in a way that cannot be repeated. Reload the page and enter it again.');
  }
  return first.data;
}

export async function storeRequestResult(tx: Tx, key: string, result: Prisma.InputJsonValue): Promise<void> {
  await tx.idempotentRequest.update({ where: { key }, data: { result } });
}

/** Keys are only needed while a retry is plausible; older ones are removed at start-up. */
export async function forgetOldRequestKeys(tx: Pick<Tx, 'idempotentRequest'>, now = new Date()): Promise<void> {
  await tx.idempotentRequest.deleteMany({ where: { createdAt: { lt: new Date(now.getTime() - 24 * 3_600_000) } } });
}
