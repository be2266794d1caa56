/**
 * The shop's path for a job and the moves allowed from each status. Only these moves are offered on the
 * job page and only these are accepted by the server. Shipping and returning unrepaired are the front
 * desk's, since they hand the motor back; quoting and the customer's approval are too.
 */
import type { JobStatus, Role } from '@/lib/db/generated/enums';

export const STATUS_LABELS: Record<JobStatus, string> = {
  RECEIVED: 'Received',
  INSPECTION: 'Inspection',
  QUOTE_SENT: 'Quote sent',
  CUSTOMER_APPROVED: 'Customer approved',
  WINDING: 'Winding',
  TESTING: 'Testing',
  READY: 'Ready',
  SHIPPED: 'Shipped',
  ON_HOLD: 'On hold',
  RETURNED_UNREPAIRED: 'Returned unrepaired',
};

/** The main path, in order (on hold and returned unrepaired are side branches). */
export const MAIN_PATH: JobStatus[] = [
  'RECEIVED',
  'INSPECTION',
  'QUOTE_SENT',
  'CUSTOMER_APPROVED',
  'WINDING',
  'TESTING',
  'READY',
  'SHIPPED',
];
export const CLOSED_STATUSES: JobStatus[] = ['SHIPPED', 'RETURNED_UNREPAIRED'];
export const OPEN_STATUSES: JobStatus[] = MAIN_PATH.filter((s) => !CLOSED_STATUSES.includes(s)).concat('ON_HOLD');

const NEXT: Record<JobStatus, JobStatus[]> = {
  RECEIVED: ['INSPECTION', 'ON_HOLD', 'RETURNED_UNREPAIRED'],
  INSPECTION: ['QUOTE_SENT', 'ON_HOLD', 'RETURNED_UNREPAIRED'],
  QUOTE_SENT: ['CUSTOMER_APPROVED', 'ON_HOLD', 'RETURNED_UNREPAIRED'],
  CUSTOMER_APPROVED: ['WINDING', 'ON_HOLD'],
  WINDING: ['TESTING', 'ON_HOLD'],
  // A failed test sends the motor back to the winding bench.
  TESTING: ['READY', 'WINDING', 'ON_HOLD'],
  READY: ['SHIPPED', 'ON_HOLD'],
  SHIPPED: [],
  // Resuming returns to where the job was held (see allowedMoves); it can also be given back unrepaired.
  ON_HOLD: ['RETURNED_UNREPAIRED'],
  RETURNED_UNREPAIRED: [],
};

const FRONT_DESK_ONLY: JobStatus[] = ['QUOTE_SENT', 'CUSTOMER_APPROVED', 'SHIPPED', 'RETURNED_UNREPAIRED'];

export function allowedMoves(from: JobStatus, heldFrom: JobStatus | null, role: Role): JobStatus[] {
  const moves = [...NEXT[from]];
  if (from === 'ON_HOLD' && heldFrom) moves.unshift(heldFrom);
  return moves.filter((to) => role === 'FRONT_DESK' || role === 'ADMIN' || !FRONT_DESK_ONLY.includes(to));
}

export function isMoveAllowed(from: JobStatus, heldFrom: JobStatus | null, to: JobStatus, role: Role): boolean {
  return allowedMoves(from, heldFrom, role).includes(to);
}

export function moveLabel(from: JobStatus, to: JobStatus): string {
  if (from === 'ON_HOLD' && to !== 'RETURNED_UNREPAIRED') return `Resume (${STATUS_LABELS[to]})`;
  if (to === 'ON_HOLD') return 'Put on hold';
  if (from === 'TESTING' && to === 'WINDING') return 'Back to winding (test failed)';
  return `Move to ${STATUS_LABELS[to]}`;
}
