import { describe, expect, it } from 'vitest';
import { shopPathSteps } from '@/lib/jobs/shop-path';

const states = (...a: Parameters<typeof shopPathSteps>) => shopPathSteps(...a).map((s) => `${s.status}:${s.state}`);

describe('the shop path steps', () => {
  it('marks the steps before the current one done, the one after it next and the rest later', () => {
    expect(states('QUOTE_SENT', null)).toEqual([
      'RECEIVED:done',
      'INSPECTION:done',
      'QUOTE_SENT:current',
      'CUSTOMER_APPROVED:next',
      'WINDING:later',
      'TESTING:later',
      'READY:later',
      'SHIPPED:later',
    ]);
  });

  it('gives the first step as current and the second as next for a new job, and every step done before shipping', () => {
    expect(states('RECEIVED', null).slice(0, 3)).toEqual(['RECEIVED:current', 'INSPECTION:next', 'QUOTE_SENT:later']);
    expect(states('SHIPPED', null).filter((s) => s.endsWith(':done'))).toHaveLength(7);
  });

  it('keeps the step a held job left as paused, with the earlier steps done', () => {
    expect(states('ON_HOLD', 'WINDING').slice(3, 6)).toEqual(['CUSTOMER_APPROVED:done', 'WINDING:paused', 'TESTING:later']);
  });

  it('says the steps of a job returned unrepaired were not reached, and never calls one current', () => {
    const s = shopPathSteps('RETURNED_UNREPAIRED', null);
    expect(new Set(s.map((x) => x.state))).toEqual(new Set(['not reached']));
  });
});
