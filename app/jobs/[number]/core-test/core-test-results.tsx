/** The recorded loop tests with their figures (density reached, W/kg as measured and at the test density). */
import Link from 'next/link';
import type { TestFigures } from '@/lib/core-test/core-test-report';
import { coreText } from '@/lib/core-test/core-test-display';
import { CORE_TEST_STAGE_LABELS } from '@/lib/core-test/core-test-schema';
import { jobRoutes } from '@/lib/routes';
import { fmt } from '@/lib/presentation/format';
import { temperatureText } from '@/lib/final-tests/display';

export function CoreTestResults({ figures, jobNumber, mayEdit }: { figures: readonly TestFigures[]; jobNumber: number; mayEdit: boolean }) {
  if (figures.length === 0) return <p>No core-loss tests recorded yet.</p>;
  return (
    <div className="table-scroll">
      <table className="core-tests" data-testid="core-tests">
        <caption className="sr-only">Core-loss tests, newest first</caption>
        <thead>
          <tr>
            <th scope="col">Test</th>
            <th scope="col">Loop and readings</th>
            <th scope="col">Density reached</th>
            <th scope="col">W/kg measured</th>
            <th scope="col">W/kg at the test density</th>
            <th scope="col">Temperatures</th>
            <th scope="col">By, instrument</th>
          </tr>
        </thead>
        <tbody>
          {figures.map(({ test: t, result, problem }) => (
            <tr key={t.id}>
              <th scope="row">
                {CORE_TEST_STAGE_LABELS[t.stage]}
                <br />
                <span className="small">{fmt.dateTime(t.testedAt)}</span>
                {mayEdit && (
                  <>
                    <br />
                    <Link className="small" href={`${jobRoutes(jobNumber).coreTest}?edit=${t.id}`}>
                      Edit
                      <span className="sr-only">
                        {' '}
                        the test {CORE_TEST_STAGE_LABELS[t.stage].toLowerCase()} of {fmt.dateTime(t.testedAt)}
                      </span>
                    </Link>
                  </>
                )}
              </th>
              <td>
                {t.data.loopTurns} turns · {fmt.num(t.data.voltageV, 1, 'V')} · {fmt.num(t.data.currentA, 2, 'A')} ·{' '}
                {fmt.num(t.data.watts, 1, 'W')} · {fmt.num(t.data.frequencyHz, 0, 'Hz')}
                {t.data.durationMin ? ` · ${t.data.durationMin} min` : ''}
              </td>
              {result ? (
                <>
                  <td>
                    {coreText.tesla(result.loss.fluxDensityT)}
                    {result.loss.farFromReference
                      ? ' ⚠ more than 10 % from the test density: the comparison leans on the B² assumption'
                      : ''}
                  </td>
                  <td>{coreText.wPerKg(result.loss.wattsPerKg)}</td>
                  <td>
                    <strong>{coreText.wPerKg(result.loss.wattsPerKgAtReference)}</strong>
                  </td>
                </>
              ) : (
                <td colSpan={3}>{problem}</td>
              )}
              <td className="small">
                ambient {t.data.ambientC !== undefined ? temperatureText(t.data.ambientC) : '—'}
                <br />
                core {t.data.coreStartC !== undefined ? temperatureText(t.data.coreStartC) : '—'} →{' '}
                {t.data.coreEndC !== undefined ? temperatureText(t.data.coreEndC) : '—'}
              </td>
              <td className="small">
                {t.testedBy?.name ?? '—'} · {t.data.instrument ?? '—'}
                {t.data.notes ? (
                  <>
                    <br />
                    {t.data.notes}
                  </>
                ) : null}
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
