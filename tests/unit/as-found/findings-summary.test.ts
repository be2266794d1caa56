import { describe, expect, it } from 'vitest';
import { findingsSummary } from '@/lib/as-found/findings-summary';
import type { LiveAnalysis } from '@/lib/as-found/live-analysis';
import type { SheetFinding } from '@/lib/engine/sheet-findings';

const empty: LiveAnalysis = { sheet: null, full: null, winding: null, findings: [], issues: [], engineError: null };
const finding = (severity: SheetFinding['severity'], message: string): SheetFinding => ({
  id: `x-${message}`,
  severity,
  message,
  check: 'look again',
});

describe('the findings strip summary', () => {
  it('counts findings by severity, most serious first, and leads with a problem', () => {
    const s = findingsSummary({
      ...empty,
      findings: [finding('note', 'n1'), finding('check', 'c1'), finding('problem', 'p1'), finding('check', 'c2')],
    });
    expect(s.headline).toBe('1 problem, 2 checks, 1 note');
    expect(s.first).toBe('p1');
    expect(s.tone).toBe('bad');
  });

  it('is a warning when only checks are found', () => {
    const s = findingsSummary({ ...empty, findings: [finding('check', 'c1')] });
    expect(s).toMatchObject({ headline: '1 check', tone: 'warn', first: 'c1' });
  });

  it('says how many fields are still missing before the full analysis can run', () => {
    const s = findingsSummary({
      ...empty,
      issues: [
        { path: 'core.boreMm', message: 'Give the bore.' },
        { path: 'core.slots', message: 'Give the slots.' },
      ],
    });
    expect(s).toMatchObject({ headline: '2 fields to fill in for the full analysis', tone: 'pending', first: 'Give the bore.' });
  });

  it('names the engine’s refusal', () => {
    const s = findingsSummary({
      ...empty,
      engineError: { code: 'invalid-input', message: 'Slots do not divide.', hint: 'Check the slots.' },
    });
    expect(s).toMatchObject({ headline: 'The analysis cannot run', tone: 'bad', first: 'Slots do not divide.' });
  });
});
