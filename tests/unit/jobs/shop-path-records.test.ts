import { describe, expect, it } from 'vitest';
import { motorSchema } from '@/lib/jobs/motor-schema';
import { GATE_MESSAGES, gateRefusal, type GateFacts } from '@/lib/jobs/shop-gates';
import { editLine } from '@/lib/jobs/job-writes';
import { statementOfWork } from '@/lib/job-sheet/job-sheet-data';

const facts = (over: Partial<GateFacts> = {}): GateFacts => ({
  latestTest: null,
  readyOverride: null,
  keepOriginal: null,
  otherSupplyAsked: null,
  approvedRedesign: null,
  hasAsFoundSheet: true,
  ...over,
});
const decision = (kind: 'ready-override' | 'keep-original-winding', recordSequence: number | null) => ({
  kind,
  reason: 'written reason',
  by: 'E',
  at: new Date(),
  recordSequence,
});

// The gates are our rules for the shop path (issue 9; docs/engineering/final-tests.md).
describe('shop-path gates', () => {
  it('holds Testing → Ready until the newest record passes or is released by an engineer', () => {
    expect(gateRefusal('TESTING', 'READY', facts())).toBe(GATE_MESSAGES.ready(null));
    expect(gateRefusal('TESTING', 'READY', facts({ latestTest: { sequence: 2, verdict: 'FAIL' } }))).toContain('#2, is FAIL');
    expect(gateRefusal('TESTING', 'READY', facts({ latestTest: { sequence: 2, verdict: 'PASS' } }))).toBeNull();
    expect(
      gateRefusal(
        'TESTING',
        'READY',
        facts({ latestTest: { sequence: 2, verdict: 'FAIL' }, readyOverride: decision('ready-override', 2) }),
      ),
    ).toBeNull();
    expect(
      gateRefusal(
        'TESTING',
        'READY',
        facts({ latestTest: { sequence: 3, verdict: 'FAIL' }, readyOverride: decision('ready-override', 2) }),
      ),
    ).not.toBeNull();
  });
  it('holds the start of winding while another supply was asked for', () => {
    const asked = facts({ otherSupplyAsked: 'a redesign request, revision 1' });
    expect(gateRefusal('CUSTOMER_APPROVED', 'WINDING', asked)).toBe(GATE_MESSAGES.winding('a redesign request, revision 1'));
    expect(gateRefusal('CUSTOMER_APPROVED', 'WINDING', { ...asked, approvedRedesign: { revision: 1 } })).toBeNull();
    expect(gateRefusal('CUSTOMER_APPROVED', 'WINDING', { ...asked, keepOriginal: decision('keep-original-winding', null) })).toBeNull();
    expect(gateRefusal('ON_HOLD', 'WINDING', asked)).toBeNull();
  });
  it('refuses to ship a job with no winding record', () => {
    expect(gateRefusal('READY', 'SHIPPED', facts({ hasAsFoundSheet: false }))).toBe(GATE_MESSAGES.shipped);
    expect(gateRefusal('READY', 'SHIPPED', facts({ hasAsFoundSheet: false, approvedRedesign: { revision: 1 } }))).toBeNull();
  });
});

describe('statement of work', () => {
  it('claims only what the records support', () => {
    expect(statementOfWork('READY', null, { revision: 1, approvedBy: 'Ravi Castellano', approvedAt: '2026-12-01' }, true, null)).toBe(
      'Rewound to redesign revision 1 approved by Ravi Castellano on 2026-12-01.',
    );
    expect(statementOfWork('SHIPPED', null, null, true, null)).toBe('Rewound to the as-found winding data.');
    expect(statementOfWork('READY', null, null, false, null)).toBe('No winding data recorded.');
    expect(statementOfWork('INSPECTION', null, null, true, null)).toBe('To be rewound to the as-found winding data.');
    expect(statementOfWork('RETURNED_UNREPAIRED', null, null, true, null)).toBe('Returned unrepaired: the winding was not rewound.');
  });
});

describe('timeline in words', () => {
  it('names the field and its old and new value', () => {
    expect(editLine('customerPo', null, '4471', new Map())).toBe('Customer PO: — → 4471');
    expect(editLine('priority', 'NORMAL', 'URGENT', new Map())).toBe('Priority: normal → urgent');
    expect(editLine('assigneeId', null, 'u1', new Map([['u1', 'Tomasz Brennan']]))).toBe('Assigned to: — → Tomasz Brennan');
  });
});

describe('a motor with an unreadable plate', () => {
  const base = { manufacturer: 'unknown', outputUnit: 'kW', phases: '3' };
  it('can be logged with voltage, frequency and speed unknown when the plate is marked unreadable', () => {
    expect(motorSchema.safeParse({ ...base, plateUnreadable: true }).success).toBe(true);
  });
  it('otherwise asks for them, saying how to log an unreadable plate', () => {
    const r = motorSchema.safeParse(base);
    expect(r.success).toBe(false);
    expect(r.error?.issues.map((i) => i.path.join('.'))).toEqual(expect.arrayContaining(['ratedVoltageV', 'frequencyHz', 'speedRpm']));
    expect(r.error?.issues[0]?.message).toContain('Plate unreadable');
  });
});
