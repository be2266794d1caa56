/**
 * Verdicts as the winder sees them: each check in words with a symbol (✓ pass, ⚠ FAIL, … not recorded),
 * the value against its limit, and the rule with its source. No hooks, so the page (saved records) and
 * the form (live verdicts) both use it.
 */
import type { SectionJudgement, TestJudgement } from '@/lib/final-tests/verdicts';
import { checkValueText, overallText, statusText } from '@/lib/final-tests/display';

export function SectionVerdict({ section, id }: { section: SectionJudgement; id?: string }) {
  return (
    <div className={`verdict ${section.status}`} data-testid={id ?? `verdict-${section.key}`}>
      <p className="verdict-head">
        <strong>{statusText(section.status)}</strong> · {section.title}
      </p>
      <ul className="verdict-checks">
        {section.checks.map((c) => (
          <li key={c.key} className={c.status}>
            <strong>{statusText(c.status)}</strong> {c.label}
            {c.verdict && (
              <>
                {' '}
                · <span className="num">{checkValueText(c)}</span>
              </>
            )}
            {(c.verdict?.rule ?? c.rule) && <span className="rule small muted"> — {c.verdict?.rule ?? c.rule}</span>}
          </li>
        ))}
      </ul>
      {section.warnings.map((w) => (
        <p key={w} className="verdict-warning small">
          <strong>⚠ Check:</strong> {w}
        </p>
      ))}
    </div>
  );
}

export function OverallVerdict({ judgement, live }: { judgement: TestJudgement | null; live?: boolean }) {
  if (!judgement) return <p className="verdict incomplete">Fill in the basis (rated voltage, insulation class) to see verdicts.</p>;
  const tone =
    judgement.overall === 'PASS' ? 'pass' : judgement.overall === 'FAIL' ? 'fail' : judgement.qualifiers.length ? 'reduced' : 'incomplete';
  return (
    <p className={`verdict overall ${tone}`} data-testid={live ? 'overall-live' : 'overall'}>
      Overall verdict{live ? ' (as typed, not yet saved)' : ''}: <strong>{overallText(judgement.overall, judgement.qualifiers)}</strong>
    </p>
  );
}
