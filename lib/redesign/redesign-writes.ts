/**
 * Writes of redesign revisions: save a request (a new revision, or the open draft) with its search result,
 * choose a candidate from that stored result, approve (reserving the wire). Each runs in a transaction with optimistic locking on the draft's version and records a job
 * event. Approved rows are never written: the code refuses first with a clear message, and a database
 * trigger refuses anyway (migration redesign_frozen_trigger).
 */
import { db, Prisma } from '@/lib/db/client';
import { redesignReport } from '@/lib/engine/redesign/report';
import type { Candidate, RedesignRequest } from '@/lib/engine/redesign/types';
import { recordJobEvent } from '@/lib/jobs/job-writes';
import { DomainError, MESSAGES } from '@/lib/errors/domain-errors';
import { storedRequestSchema } from '@/lib/redesign/redesign-schema';
import type { SessionUser } from '@/lib/auth/session-store';
import { loadRedesignContext, runSearch } from './redesign-context';
import { isStoredSearch, toStoredSearch } from './stored-search';
import { REDESIGN_SNAPSHOT_FORMAT, REDESIGN_SNAPSHOT_VERSION, type RedesignSnapshot } from './snapshot';

/** Messages pinned by the tests. */
export const REDESIGN_MESSAGES = {
  frozen: (revision: number) =>
    `Revision ${revision} is approved and frozen: it cannot be changed. Start a new revision to change the design; it will need approval again.`,
  stale:
    'Someone else changed this redesign while you were looking at it. The page now shows the current revision: check it, then try again.',
  noChoice: 'Choose a candidate before approving.',
  sheetChanged: 'The as-found sheet was changed after this request was made. Run the search again so the approval matches the sheet.',
  candidateGone:
    'The chosen candidate is no longer among the results (the stock or the shop limits changed). Choose again from the current list.',
  noStoredSearch: 'This revision has no stored search result. Submit the request again to search.',
} as const;

type Tx = Prisma.TransactionClient;

const describeTarget = (r: RedesignRequest): string =>
  `${r.target.lineVoltageV} V ${r.target.frequencyHz} Hz, ${r.target.poles} poles, ${r.target.connection === 'either' ? 'star or delta' : r.target.connection}`;

async function draftForUpdate(tx: Tx, redesignId: string, version: number) {
  const row = await tx.redesign.findUnique({ where: { id: redesignId } });
  if (!row) throw new DomainError('not-found', MESSAGES.notFound('redesign'));
  if (row.status === 'APPROVED') throw new DomainError('frozen', REDESIGN_MESSAGES.frozen(row.revision));
  if (row.version !== version) throw new DomainError('stale', REDESIGN_MESSAGES.stale);
  return row;
}

/** Turns a unique-key race (two new revisions at once) into the stale message. */
function staleOnRace(err: unknown): never {
  if (err instanceof Prisma.PrismaClientKnownRequestError && err.code === 'P2002') throw new DomainError('stale', REDESIGN_MESSAGES.stale);
  throw err;
}

/**
 * Saves a request. While the newest revision is a draft, the request replaces the draft's (its version
 * must match); after an approval it opens the next revision, which will need approval again.
 */
export async function saveRedesignRequest(
  user: SessionUser,
  jobId: string,
  draftVersion: number | undefined,
  request: RedesignRequest,
): Promise<{ id: string; revision: number; version: number }> {
  const ctx = await loadRedesignContext(jobId);
  if (!ctx.ok) throw new DomainError('invalid', ctx.reason);
  const searched = await runSearch(ctx.value, request);
  if (!searched.ok) {
    const field = searched.error.field ?? '_form';
    throw new DomainError('invalid', `${searched.error.message} ${searched.error.hint}`, {
      [field]: [`${searched.error.message} ${searched.error.hint}`],
    });
  }
  const stored = toStoredSearch(searched.value, ctx.value.sheet.revision);
  return db()
    .$transaction(async (tx) => {
      const latest = await tx.redesign.findFirst({ where: { jobId }, orderBy: { revision: 'desc' } });
      const data = {
        request: request as unknown as Prisma.InputJsonObject,
        sheetRevision: ctx.value.sheet.revision,
        chosenKey: null,
        search: stored as unknown as Prisma.InputJsonObject,
        searchedAt: new Date(),
      };
      if (latest && latest.status === 'DRAFT') {
        if (draftVersion !== undefined && draftVersion !== latest.version) throw new DomainError('stale', REDESIGN_MESSAGES.stale);
        const r = await tx.redesign.updateMany({
          where: { id: latest.id, version: latest.version, status: 'DRAFT' },
          data: { ...data, version: { increment: 1 } },
        });
        if (r.count === 0) throw new DomainError('stale', REDESIGN_MESSAGES.stale);
        await recordJobEvent(tx, {
          jobId,
          userId: user.id,
          kind: 'REDESIGN',
          message: `Redesign revision ${latest.revision}: request changed to ${describeTarget(request)}.`,
        });
        return { id: latest.id, revision: latest.revision, version: latest.version + 1 };
      }
      const revision = (latest?.revision ?? 0) + 1;
      const row = await tx.redesign.create({ data: { jobId, revision, createdById: user.id, ...data } });
      await recordJobEvent(tx, {
        jobId,
        userId: user.id,
        kind: 'REDESIGN',
        message: `Redesign revision ${revision} opened: ${describeTarget(request)}.`,
      });
      return { id: row.id, revision, version: row.version };
    })
    .catch(staleOnRace);
}

/** Records the chosen candidate of a draft; the key must be one of the revision's stored search result. */
export async function chooseRedesignCandidate(
  user: SessionUser,
  input: { redesignId: string; version: number; key: string },
): Promise<{ version: number; rank: number }> {
  return db().$transaction(async (tx) => {
    const row = await draftForUpdate(tx, input.redesignId, input.version);
    if (!isStoredSearch(row.search)) throw new DomainError('invalid', REDESIGN_MESSAGES.noStoredSearch);
    const candidate = row.search.search.candidates.find((c) => c.key === input.key);
    if (!candidate) throw new DomainError('invalid', REDESIGN_MESSAGES.candidateGone);
    const r = await tx.redesign.updateMany({
      where: { id: row.id, version: row.version, status: 'DRAFT' },
      data: { chosenKey: candidate.key, version: { increment: 1 } },
    });
    if (r.count === 0) throw new DomainError('stale', REDESIGN_MESSAGES.stale);
    await recordJobEvent(tx, {
      jobId: row.jobId,
      userId: user.id,
      kind: 'REDESIGN',
      message: `Redesign revision ${row.revision}: candidate ${candidate.rank} chosen (${candidate.winding.turnsPerCoil.join('/')} turns, ${candidate.winding.connection}, ${candidate.winding.parallelPaths} circuit(s), ${candidate.wires.label}).`,
    });
    return { version: row.version + 1, rank: candidate.rank };
  });
}

/**
 * Approves a draft: searches again (off the request thread) with the stored request on the current sheet and
 * stock, checks the chosen candidate is still there, freezes request, candidate and full report as the
 * snapshot, reserves its wire from stock and releases the wire of the revision it supersedes.
 */
export async function approveRedesign(
  user: SessionUser,
  input: { redesignId: string; version: number; note: string },
): Promise<{ revision: number }> {
  const head = await db().redesign.findUnique({
    where: { id: input.redesignId },
    select: { jobId: true, request: true, job: { select: { number: true } } },
  });
  if (!head) throw new DomainError('not-found', MESSAGES.notFound('redesign'));
  const ctx = await loadRedesignContext(head.jobId);
  if (!ctx.ok) throw new DomainError('invalid', ctx.reason);
  const request = storedRequestSchema.parse(head.request);
  const searched = await runSearch(ctx.value, request);
  if (!searched.ok) throw new DomainError('invalid', `${searched.error.message} ${searched.error.hint}`);
  const stockRows = await db().wireStock.findMany({ select: { id: true, standard: true, size: true, enamelGrade: true } });
  return db().$transaction(async (tx) => {
    const row = await draftForUpdate(tx, input.redesignId, input.version);
    if (!row.chosenKey) throw new DomainError('invalid', REDESIGN_MESSAGES.noChoice);
    if (row.sheetRevision !== ctx.value.sheet.revision) throw new DomainError('stale', REDESIGN_MESSAGES.sheetChanged);
    // The request cannot have changed since it was read: a change bumps the version draftForUpdate checked.
    const candidate = searched.value.candidates.find((c) => c.key === row.chosenKey);
    if (!candidate) throw new DomainError('invalid', REDESIGN_MESSAGES.candidateGone);
    const report = redesignReport(ctx.value.original, request, searched.value, candidate);
    if (!report.ok) throw new DomainError('invalid', `${report.error.message} ${report.error.hint}`);
    const at = new Date();
    const snapshot: RedesignSnapshot = {
      format: REDESIGN_SNAPSHOT_FORMAT,
      version: REDESIGN_SNAPSHOT_VERSION,
      jobNumber: head.job.number,
      revision: row.revision,
      sheet: { id: ctx.value.sheet.id, revision: ctx.value.sheet.revision },
      request,
      original: ctx.value.original,
      originalBasis: searched.value.originalBasis,
      report: report.value,
      search: {
        familiesTried: searched.value.familiesTried,
        candidatesFound: searched.value.candidates.length,
        rank: candidate.rank,
        rejected: searched.value.rejected,
      },
      approval: { byId: user.id, byName: user.name, at: at.toISOString(), note: input.note },
    };
    const r = await tx.redesign.updateMany({
      where: { id: row.id, version: row.version, status: 'DRAFT' },
      data: {
        status: 'APPROVED',
        approvedById: user.id,
        approvedAt: at,
        approvalNote: input.note,
        snapshot: snapshot as unknown as Prisma.InputJsonObject,
        search: toStoredSearch(searched.value, ctx.value.sheet.revision) as unknown as Prisma.InputJsonObject,
        searchedAt: at,
        version: { increment: 1 },
      },
    });
    if (r.count === 0) throw new DomainError('stale', REDESIGN_MESSAGES.stale);
    const reserved = await reserveWire(tx, row.id, row.jobId, candidate, stockRows, at);
    await recordJobEvent(tx, {
      jobId: row.jobId,
      userId: user.id,
      kind: 'REDESIGN_APPROVED',
      message: `Redesign revision ${row.revision} approved by ${user.name}: ${candidate.winding.turnsPerCoil.join('/')} turns, ${candidate.winding.connection}, ${candidate.wires.label}.${reserved.length > 0 ? ` Wire reserved: ${reserved.join(', ')}.` : ''}`,
      data: { revision: row.revision, key: candidate.key },
    });
    return { revision: row.revision };
  });
}

/**
 * Reserves the candidate's wire (kg per size, as wound) from the stock rows that hold its sizes, and releases
 * the reservations of the job's earlier revisions, which this approval supersedes. Sizes the stock does not
 * list are not reserved (the comparison marked them short).
 */
async function reserveWire(
  tx: Tx,
  redesignId: string,
  jobId: string,
  candidate: Candidate,
  stockRows: { id: string; standard: string; size: string; enamelGrade: number }[],
  at: Date,
): Promise<string[]> {
  await tx.wireReservation.updateMany({ where: { releasedAt: null, redesign: { jobId }, NOT: { redesignId } }, data: { releasedAt: at } });
  const out: string[] = [];
  for (const [i, part] of candidate.wires.parts.entries()) {
    const stock = stockRows.find(
      (s) => s.standard === part.wire.standard && s.size === part.wire.size && s.enamelGrade === part.wire.enamelGrade,
    );
    const kg = candidate.wireNeeds[i]?.kg ?? 0;
    if (!stock || !(kg > 0)) continue;
    await tx.wireReservation.create({ data: { redesignId, stockId: stock.id, kg, createdAt: at } });
    out.push(`${kg.toFixed(2)} kg of ${part.wire.label}`);
  }
  return out;
}
