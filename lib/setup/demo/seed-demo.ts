/**
 * Seeds the invented demo shop on a first start of the embedded database (and when asked to on a real
 * PostgreSQL, e.g. for the end-to-end tests). Deterministic: the same jobs every time.
 *
 * The seed runs in ONE transaction: a process killed during a first start leaves an empty database that
 * the next start seeds again. Each step also skips what already exists, so a database half-seeded by an
 * earlier version (which wrote row by row) is completed on the next start, and the job counter is derived
 * from the jobs rather than written blindly (see repairJobCounter).
 */
import type { Prisma, PrismaClient } from '@/lib/db/generated/client';
import type { JobStatus, Priority, Role } from '@/lib/db/generated/enums';
import { hashPassword } from '@/lib/auth/password';
import { FIRST_JOB_NUMBER } from '@/lib/jobs/job-writes';
import { demoSheet } from './demo-sheets';
import { seedStock } from './seed-stock';
import { DEMO_CUSTOMERS, DEMO_FAULTS, DEMO_MANUFACTURERS, DEMO_RATINGS, DEMO_USERS } from './demo-data';

/** A small seeded generator (mulberry32) so demo data is the same on every machine. */
function rng(seed: number) {
  let a = seed;
  return () => {
    a = (a + 0x6d2b79f5) | 0;
    let t = Math.imul(a ^ (a >>> 15), 1 | a);
    t = (t + Math.imul(t ^ (t >>> 7), 61 | t)) ^ t;
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

const STATUS_SPREAD: JobStatus[] = [
  'RECEIVED',
  'RECEIVED',
  'RECEIVED',
  'RECEIVED',
  'INSPECTION',
  'INSPECTION',
  'INSPECTION',
  'INSPECTION',
  'QUOTE_SENT',
  'QUOTE_SENT',
  'QUOTE_SENT',
  'CUSTOMER_APPROVED',
  'CUSTOMER_APPROVED',
  'CUSTOMER_APPROVED',
  'WINDING',
  'WINDING',
  'WINDING',
  'WINDING',
  'WINDING',
  'TESTING',
  'TESTING',
  'TESTING',
  'READY',
  'READY',
  'READY',
  'SHIPPED',
  'SHIPPED',
  'SHIPPED',
  'SHIPPED',
  'ON_HOLD',
  'ON_HOLD',
  'RETURNED_UNREPAIRED',
  'INSPECTION',
  'WINDING',
  'RECEIVED',
  'TESTING',
  'QUOTE_SENT',
  'READY',
  'CUSTOMER_APPROVED',
  'WINDING',
];
/** Jobs past inspection have had their winding recorded. */
const SHEET_STATUSES: JobStatus[] = ['QUOTE_SENT', 'CUSTOMER_APPROVED', 'WINDING', 'TESTING', 'READY', 'SHIPPED'];
const PRIORITIES: Priority[] = ['NORMAL', 'NORMAL', 'NORMAL', 'HIGH', 'LOW', 'URGENT'];

/** The demo administrator: present only in a demo database. */
const DEMO_MARKER_EMAIL = DEMO_USERS.find((u) => u.role === 'ADMIN')?.email ?? 'admin@demo.coilwright';

/**
 * Whether the demo shop should be seeded now: nothing is there yet, or an earlier seed never finished
 * (its demo people exist but the job counter, written last, does not).
 */
export async function demoSeedNeeded(prisma: PrismaClient): Promise<boolean> {
  if ((await prisma.user.count()) === 0) return true;
  const [counter, marker] = await Promise.all([
    prisma.jobCounter.findUnique({ where: { id: 'job' } }),
    prisma.user.findUnique({ where: { email: DEMO_MARKER_EMAIL }, select: { id: true } }),
  ]);
  return counter === null && marker !== null;
}

/**
 * Makes the job counter at least the highest job number, so the next intake never collides with an
 * existing job (a crash mid-seed once left jobs without a counter and every intake failed on 1001).
 * Idempotent; run on every start.
 */
export async function repairJobCounter(prisma: PrismaClient | Prisma.TransactionClient): Promise<void> {
  await prisma.$executeRaw`
    INSERT INTO "JobCounter" ("id", "value")
    SELECT 'job', max("number") FROM "Job" HAVING max("number") IS NOT NULL
    ON CONFLICT ("id") DO UPDATE SET "value" = GREATEST("JobCounter"."value", EXCLUDED."value")`;
}

export async function seedDemoShop(prisma: PrismaClient, now = new Date()): Promise<void> {
  // bcrypt is slow on purpose: hash before the transaction so it stays short.
  const hashes = await Promise.all(DEMO_USERS.map((u) => hashPassword(u.password)));
  await prisma.$transaction((tx) => seedInside(tx, hashes, now), { maxWait: 30_000, timeout: 180_000 });
}

async function seedInside(tx: Prisma.TransactionClient, hashes: string[], now: Date): Promise<void> {
  const rand = rng(20261201);
  const pick = <T>(xs: readonly T[]): T => xs[Math.floor(rand() * xs.length)] as T;
  const users = [];
  for (const [i, u] of DEMO_USERS.entries()) {
    users.push(
      await tx.user.upsert({
        where: { email: u.email },
        create: { name: u.name, email: u.email, role: u.role as Role, passwordHash: hashes[i] ?? '' },
        update: {},
      }),
    );
  }
  const staff = users.filter((u) => u.role === 'WINDER' || u.role === 'ENGINEER');
  const desk = users.find((u) => u.role === 'FRONT_DESK');
  const customers = [];
  for (const c of DEMO_CUSTOMERS) {
    const existing = await tx.customer.findFirst({ where: { company: c.company }, orderBy: { createdAt: 'asc' } });
    customers.push(
      existing ??
        (await tx.customer.create({
          data: {
            company: c.company,
            phone: c.phone,
            email: c.email,
            contacts: { create: { name: c.contact, phone: c.phone, email: c.email } },
          },
        })),
    );
  }
  const seeded = new Map(
    (
      await tx.job.findMany({
        where: { number: { gte: FIRST_JOB_NUMBER, lt: FIRST_JOB_NUMBER + STATUS_SPREAD.length } },
        select: { id: true, number: true, windingSheet: { select: { id: true } } },
      })
    ).map((j) => [j.number, j]),
  );
  const day = 86_400_000;
  for (let i = 0; i < STATUS_SPREAD.length; i++) {
    // Every random draw happens whether or not the job exists, so a completed seed equals a fresh one.
    const status = STATUS_SPREAD[i] as JobStatus;
    const [kw, volts, hz, poles, rpm, connection, frame] = DEMO_RATINGS[i % DEMO_RATINGS.length] as (typeof DEMO_RATINGS)[number];
    const eff = 0.82 + (Math.min(kw, 55) / 55) * 0.13;
    const pf = 0.78 + (Math.min(kw, 55) / 55) * 0.08;
    const amps = Math.round(((kw * 1000) / (Math.sqrt(3) * volts * eff * pf)) * 10) / 10;
    const customer = customers[i % customers.length]!;
    const manufacturer = pick(DEMO_MANUFACTURERS);
    const codeLetter = pick(['G', 'H', 'J', 'K']);
    const receivedAt = new Date(now.getTime() - (40 - i) * day * 0.9);
    const promisedAt = new Date(receivedAt.getTime() + (14 + Math.floor(rand() * 30)) * day);
    const number = FIRST_JOB_NUMBER + i;
    const priority = pick(PRIORITIES);
    const customerPo = rand() > 0.3 ? `PO-${4000 + i * 13}` : null;
    const assigneeId = status === 'RECEIVED' ? null : pick(staff).id;
    const moverId = pick(staff).id;
    const sheetById = SHEET_STATUSES.includes(status) ? pick(staff).id : null;
    // History stays in the past: steps are spread over the time since intake (the newest job arrived
    // under a day ago, so a fixed "one day later" would have dated its move in the future).
    const since = now.getTime() - receivedAt.getTime();
    const at = (k: number) => new Date(receivedAt.getTime() + Math.min(k * day, (since * k) / 4));
    // An on-hold job was held from QUOTE_SENT; its history says so, and it resumes there.
    const heldFrom: JobStatus | null = status === 'ON_HOLD' ? 'QUOTE_SENT' : null;
    const moves: { from: JobStatus; to: JobStatus }[] =
      status === 'RECEIVED'
        ? []
        : heldFrom
          ? [
              { from: 'RECEIVED', to: heldFrom },
              { from: heldFrom, to: status },
            ]
          : [{ from: 'RECEIVED', to: status }];
    const model = `${manufacturer.slice(0, 2).toUpperCase()}-${frame}-${poles}P`;

    let jobId = seeded.get(number)?.id;
    if (!jobId) {
      const motor = await tx.motor.create({
        data: {
          customerId: customer.id,
          manufacturer,
          model,
          serial: `${manufacturer.slice(0, 1)}${(700_000 + i * 7919).toString()}`,
          frame,
          outputKw: kw,
          voltages: String(volts),
          ratedVoltageV: volts,
          connection,
          currentA: amps,
          frequencyHz: hz,
          speedRpm: rpm,
          serviceFactor: hz === 60 ? 1.15 : 1.0,
          insulationClass: kw > 10 ? 'F' : 'B',
          duty: 'S1',
          enclosure: kw > 30 ? 'IP55' : 'IP54',
          efficiencyPercent: Math.round(eff * 1000) / 10,
          powerFactor: Math.round(pf * 100) / 100,
          codeLetter,
          designLetter: hz === 60 ? 'B' : null,
          bearingDriveEnd: kw > 20 ? '6312-C3' : '6206-2Z',
          bearingOppositeEnd: kw > 20 ? '6310-C3' : '6205-2Z',
        },
      });
      const job = await tx.job.create({
        data: {
          number,
          customerId: customer.id,
          motorId: motor.id,
          status,
          heldFrom,
          receivedAt,
          promisedAt,
          priority,
          customerPo,
          reportedFault: DEMO_FAULTS[i % DEMO_FAULTS.length]!,
          assigneeId,
          events: {
            create: [
              {
                userId: desk?.id ?? null,
                at: receivedAt,
                kind: 'CREATED',
                toStatus: 'RECEIVED',
                message: `Job ${number} logged at intake.`,
              },
              ...moves.map((m, k) => ({
                userId: moverId,
                at: at(k + 1),
                kind: 'STATUS',
                fromStatus: m.from,
                toStatus: m.to,
                message:
                  m.to === 'ON_HOLD' ? 'Demo history: put on hold.' : `Demo history: moved to ${m.to.toLowerCase().replace(/_/g, ' ')}.`,
              })),
            ],
          },
        },
      });
      jobId = job.id;
    }
    if (sheetById && !seeded.get(number)?.windingSheet) {
      const sheet = demoSheet({ kw, volts, hz, poles, connection, amps });
      const savedAt = at(moves.length + 1);
      await tx.windingSheet.create({
        data: {
          jobId,
          data: sheet as object,
          slots: sheet.core.slots,
          poles: sheet.supply.poles,
          boreMm: sheet.core.boreMm,
          coreLengthMm: sheet.core.coreLengthMm,
          lineVoltageV: volts,
          frequencyHz: hz,
          outputKw: kw,
          manufacturer,
          model,
          updatedById: sheetById,
          // Revision 1 in the history, as a sheet saved through the form has.
          revisions: { create: { revision: 1, data: sheet as object, savedById: sheetById, savedAt } },
        },
      });
    }
  }
  await seedStock(tx);
  await repairJobCounter(tx);
}
