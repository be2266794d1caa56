/**
 * Which shop-path statuses lock which workshop record: one table, used by the writes (which refuse) and the
 * screens (which show the record read-only and say why). A job on hold is judged by the status it was
 * held from, so putting a job on hold never unlocks or locks anything.
 */
import type { JobStatus } from '@/lib/db/generated/enums';

export const RECORD_LOCKS = {
  /** The as-found data sheet is history once the rewound motor is on the test floor. */
  asFoundSheet: ['TESTING', 'READY', 'SHIPPED', 'RETURNED_UNREPAIRED'],
  /** Final tests can be recorded and retested until the motor leaves the shop. */
  finalTests: ['SHIPPED', 'RETURNED_UNREPAIRED'],
  /** Core-loss (loop) tests likewise: a repeat test after a core repair is normal until the motor leaves. */
  coreTests: ['SHIPPED', 'RETURNED_UNREPAIRED'],
} as const satisfies Record<string, readonly JobStatus[]>;

export type LockedRecord = keyof typeof RECORD_LOCKS;

/** The status that decides: where a job on hold was held from, otherwise its own. */
export const effectiveStatus = (status: JobStatus, heldFrom: JobStatus | null): JobStatus =>
  status === 'ON_HOLD' && heldFrom ? heldFrom : status;

export function isRecordLocked(record: LockedRecord, status: JobStatus, heldFrom: JobStatus | null): boolean {
  return (RECORD_LOCKS[record] as readonly JobStatus[]).includes(effectiveStatus(status, heldFrom));
}
