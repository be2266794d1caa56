/**
 * Seeds the invented demo shop on a first start of the embedded database (and when asked to on a real
 * PostgreSQL, e.g. for the end-to-end tests). Deterministic: the same jobs every time.
 */
import type { PrismaClient } from '@/lib/db/generated/client';
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
  'RECEIVED', 'RECEIVED', 'RECEIVED', 'RECEIVED', 'INSPECTION', 'INSPECTION', 'INSPECTION', 'INSPECTION', 'QUOTE_SENT', 'QUOTE_SENT',
  'QUOTE_SENT', 'CUSTOMER_APPROVED', 'CUSTOMER_APPROVED', 'CUSTOMER_APPROVED', 'WINDING', 'WINDING', 'WINDING', 'WINDING', 'WINDING',
  'TESTING', 'TESTING', 'TESTING', 'READY', 'READY', 'READY', 'SHIPPED', 'SHIPPED', 'SHIPPED', 'SHIPPED', 'ON_HOLD', 'ON_HOLD',
  'RETURNED_UNREPAIRED', 'INSPECTION', 'WINDING', 'RECEIVED', 'TESTING', 'QUOTE_SENT', 'READY', 'CUSTOMER_APPROVED', 'WINDING',
];
/** Jobs past inspection have had their winding recorded. */
const SHEET_STATUSES: JobStatus[] = ['QUOTE_SENT', 'CUSTOMER_APPROVED', 'WINDING', 'TESTING', 'READY', 'SHIPPED'];
const PRIORITIES: Priority[] = ['NORMAL', 'NORMAL', 'NORMAL', 'HIGH', 'LOW', 'URGENT'];

export async function isEmpty(prisma: PrismaClient): Promise<boolean> {
  return (await prisma.user.count()) === 0;
}

export async function seedDemoShop(prisma: PrismaClient, now = new Date()): Promise<void> {
  const rand = rng(20261201);
  const pick = <T>(xs: readonly T[]): T => xs[Math.floor(rand() * xs.length)] as T;
  const users = [];
  for (const u of DEMO_USERS) {
    users.push(await prisma.user.create({ data: { name: u.name, email: u.email, role: u.role as Role, passwordHash: await hashPassword(u.password) } }));
  }
  const staff = users.filter((u) => u.role === 'WINDER' || u.role === 'ENGINEER');
  const desk = users.find((u) => u.role === 'FRONT_DESK');
  const customers = [];
  for (const c of DEMO_CUSTOMERS) {
    customers.push(
      await prisma.customer.create({
        data: { company: c.company, phone: c.phone, email: c.email, contacts: { create: { name: c.contact, phone: c.phone, email: c.email } } },
      }),
    );
  }
  const day = 86_400_000;
  for (let i = 0; i < STATUS_SPREAD.length; i++) {
    const status = STATUS_SPREAD[i] as JobStatus;
    const [kw, volts, hz, poles, rpm, connection, frame] = DEMO_RATINGS[i % DEMO_RATINGS.length] as (typeof DEMO_RATINGS)[number];
    const eff = 0.82 + Math.min(kw, 55) / 55 * 0.13;
    const pf = 0.78 + Math.min(kw, 55) / 55 * 0.08;
    const amps = Math.round(((kw * 1000) / (Math.sqrt(3) * volts * eff * pf)) * 10) / 10;
    const customer = customers[i % customers.length]!;
    const manufacturer = pick(DEMO_MANUFACTURERS);
    const motor = await prisma.motor.create({
      data: {
        customerId: customer.id,
        manufacturer,
        model: `${manufacturer.slice(0, 2).toUpperCase()}-${frame}-${poles}P`,
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
        codeLetter: pick(['G', 'H', 'J', 'K']),
        designLetter: hz === 60 ? 'B' : null,
        bearingDriveEnd: kw > 20 ? '6312-C3' : '6206-2Z',
        bearingOppositeEnd: kw > 20 ? '6310-C3' : '6205-2Z',
      },
    });
    const receivedAt = new Date(now.getTime() - (40 - i) * day * 0.9);
    const promisedAt = new Date(receivedAt.getTime() + (14 + Math.floor(rand() * 30)) * day);
    const number = FIRST_JOB_NUMBER + i;
    const job = await prisma.job.create({
      data: {
        number,
        customerId: customer.id,
        motorId: motor.id,
        status,
        heldFrom: status === 'ON_HOLD' ? 'QUOTE_SENT' : null,
        receivedAt,
        promisedAt,
        priority: pick(PRIORITIES),
        customerPo: rand() > 0.3 ? `PO-${4000 + i * 13}` : null,
        reportedFault: DEMO_FAULTS[i % DEMO_FAULTS.length]!,
        assigneeId: status === 'RECEIVED' ? null : pick(staff).id,
        events: {
          create: [
            { userId: desk?.id ?? null, at: receivedAt, kind: 'CREATED', toStatus: 'RECEIVED', message: `Job ${number} logged at intake.` },
            ...(status === 'RECEIVED'
              ? []
              : [{ userId: pick(staff).id, at: new Date(receivedAt.getTime() + day), kind: 'STATUS', fromStatus: 'RECEIVED' as JobStatus, toStatus: status, message: `Demo history: moved to ${status.toLowerCase().replace(/_/g, ' ')}.` }]),
          ],
        },
      },
    });
    if (SHEET_STATUSES.includes(status)) {
      const sheet = demoSheet({ kw, volts, hz, poles, connection, amps });
      await prisma.windingSheet.create({
        data: {
          jobId: job.id, data: sheet as object, slots: sheet.core.slots, poles: sheet.supply.poles, boreMm: sheet.core.boreMm,
          coreLengthMm: sheet.core.coreLengthMm, lineVoltageV: volts, frequencyHz: hz, outputKw: kw, manufacturer, model: motor.model,
          updatedById: pick(staff).id,
        },
      });
    }
  }
  await seedStock(prisma);
  await prisma.jobCounter.upsert({
    where: { id: 'job' },
    create: { id: 'job', value: FIRST_JOB_NUMBER + STATUS_SPREAD.length - 1 },
    update: { value: FIRST_JOB_NUMBER + STATUS_SPREAD.length - 1 },
  });
}
