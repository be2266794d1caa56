/** A saved record's readings, section by section (the same rows the job sheet prints). */
import type { TestDataValues } from '@/lib/final-tests/test-record-schema';
import { readingSections } from '@/lib/final-tests/readings';
import { judgeTestRecord } from '@/lib/final-tests/verdicts';

export function RecordReadings({ data }: { data: TestDataValues }) {
  const sections = readingSections(data, judgeTestRecord(data));
  return (
    <details className="readings">
      <summary>Readings</summary>
      <div className="grid" style={{ gridTemplateColumns: 'repeat(auto-fit, minmax(300px, 1fr))' }}>
        {sections.map((s) => (
          <div key={s.key}>
            <h3 className="small">{s.title}</h3>
            <dl className="dl small">
              {s.rows.map((r) => (
                <div key={r.label} style={{ display: 'contents' }}>
                  <dt>{r.label}</dt>
                  <dd>{r.value}</dd>
                </div>
              ))}
            </dl>
          </div>
        ))}
      </div>
      {data.notes && <p className="small">Notes: {data.notes}</p>}
    </details>
  );
}
