/**
 * The kinds of entry on a job's timeline: one list, so every writer names a known kind and a reader can
 * group or filter by it. Stored as text (JobEvent.kind), so adding a kind needs no migration.
 */
export const JOB_EVENT_KINDS = [
  'CREATED',
  'EDIT',
  'STATUS',
  'PHOTO',
  'SHEET',
  'REDESIGN',
  'REDESIGN_APPROVED',
  'TESTS',
  'DECISION',
  'CORE_TEST',
  'QUOTE',
  'LABOUR',
] as const;

export type JobEventKind = (typeof JOB_EVENT_KINDS)[number];
