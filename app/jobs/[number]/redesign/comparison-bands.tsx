import type { Band } from '@/lib/redesign/comparison-bands';

const W = 320;
const H = 44;
const X0 = 8;
const X1 = W - 8;
const MARKS = ['A', 'B'] as const;

/**
 * One quantity as a horizontal band: the allowed range hatched, the as-found value as a diamond, each pinned
 * candidate as a lettered circle (A, B). Shapes and letters carry the meaning, never colour alone; the SVG has
 * a title and a description, and the numbers sit in the table below.
 */
function BandSvg({ band, id }: { band: Band; id: string }) {
  const [d0, d1] = band.domain;
  const x = (v: number): number => X0 + ((v - d0) / (d1 - d0 || 1)) * (X1 - X0);
  const desc = `Allowed ${band.allowedText}. As found ${band.originalText}. ${band.values.map((_, i) => `Candidate ${MARKS[i]} ${band.texts[i]}`).join('. ')}.`;
  return (
    <svg viewBox={`0 0 ${W} ${H}`} width="100%" height={H} role="img" aria-labelledby={`${id}-t ${id}-d`} className="band">
      <title id={`${id}-t`}>{band.label}</title>
      <desc id={`${id}-d`}>{desc}</desc>
      <defs>
        <pattern id={`${id}-hatch`} width="6" height="6" patternUnits="userSpaceOnUse" patternTransform="rotate(45)">
          <line x1="0" y1="0" x2="0" y2="6" className="band-hatch" strokeWidth="2" />
        </pattern>
      </defs>
      <line x1={X0} x2={X1} y1={22} y2={22} className="band-axis" />
      <rect
        x={x(band.allowed[0])}
        y={12}
        width={Math.max(1, x(band.allowed[1]) - x(band.allowed[0]))}
        height={20}
        fill={`url(#${id}-hatch)`}
        className="band-allowed"
      />
      <path d={`M ${x(band.original)} 14 l 7 8 l -7 8 l -7 -8 z`} className="band-original" />
      {band.values.map((v, i) => (
        <g key={MARKS[i]} transform={`translate(${x(v)}, ${i === 0 ? 8 : 36})`}>
          <circle r="7.5" className={`band-mark band-mark-${i}`} />
          <text textAnchor="middle" dy="3.5" fontSize="10" className="band-letter">
            {MARKS[i]}
          </text>
        </g>
      ))}
    </svg>
  );
}

/** The bands for the pinned candidates, with a legend and the numbers one click away. */
export function ComparisonBands({ bands, labels }: { bands: Band[]; labels: string[] }) {
  return (
    <div className="bands">
      <p className="small legend">
        <span aria-hidden="true">▨</span> allowed range · <span aria-hidden="true">◆</span> as found ·{' '}
        {labels.map((l, i) => (
          <span key={l}>
            {i > 0 ? ' · ' : ''}
            <span aria-hidden="true">●</span> <strong>{MARKS[i]}</strong> = {l}
          </span>
        ))}
      </p>
      <ul className="band-list">
        {bands.map((b) => (
          <li key={b.key}>
            <span className="band-label">{b.label}</span>
            <BandSvg band={b} id={`band-${b.key}`} />
            {b.note && <span className="small muted">{b.note}</span>}
          </li>
        ))}
      </ul>
      <details>
        <summary>Numbers</summary>
        <table className="compare" aria-label="Pinned candidates beside the as-found winding">
          <thead>
            <tr>
              <th scope="col">Quantity</th>
              <th scope="col">Allowed</th>
              <th scope="col">As found</th>
              {labels.map((l, i) => (
                <th key={l} scope="col">
                  {MARKS[i]}: {l}
                </th>
              ))}
            </tr>
          </thead>
          <tbody>
            {bands.map((b) => (
              <tr key={b.key}>
                <th scope="row">{b.label}</th>
                <td>{b.allowedText}</td>
                <td>{b.originalText}</td>
                {b.texts.map((t, i) => (
                  <td key={MARKS[i]}>{t}</td>
                ))}
              </tr>
            ))}
          </tbody>
        </table>
      </details>
    </div>
  );
}
