'use client';

/**
 * The stator MMF round the air gap at one instant, and its space-harmonic spectrum with each order's
 * direction (forward, backward, cancelled), from lib/engine/mmf-spectrum.ts. Directions are written on the
 * bars (→ forward, ← backward, × cancelled) and drawn with different fills, not told by colour alone.
 */
import { Bar, BarChart, CartesianGrid, LabelList, Line, LineChart, ResponsiveContainer, Tooltip, XAxis, YAxis } from 'recharts';
import type { MmfSpectrum, MmfPoint, MmfDirection } from '@/lib/engine/mmf-spectrum';

const MARK: Record<MmfDirection, string> = { forward: '→', backward: '←', both: '↔', cancelled: '×' };
const WORD: Record<MmfDirection, string> = { forward: 'forward', backward: 'backward', both: 'pulsating', cancelled: 'cancelled' };

/** Orders worth a bar: whole orders up to 25 that a phase carries, plus any fractional order present. */
export function spectrumBars(mmf: MmfSpectrum, maxOrder = 25) {
  return mmf.harmonics
    .filter((h) => h.order <= maxOrder && (h.relativeAmplitude > 1e-4 || h.singlePhaseRelative > 1e-4))
    .map((h) => ({
      order: Number.isInteger(h.order) ? String(h.order) : h.order.toFixed(2),
      percent: Math.round(h.relativeAmplitude * 1000) / 10,
      label: `${MARK[h.direction]}${h.direction === 'cancelled' ? '' : ` ${(h.relativeAmplitude * 100).toFixed(1)}`}`,
      direction: h.direction,
      rpm: Math.round(h.speedRpm),
    }));
}

/** The waveform at every `stepDeg` degrees (the point nearest each), for the table beside the chart. */
export function waveformSamples(waveform: MmfPoint[], stepDeg = 15): { angle: number; mmf: number }[] {
  if (waveform.length === 0) return [];
  const out: { angle: number; mmf: number }[] = [];
  for (let a = 0; a <= 360; a += stepDeg) {
    let best = waveform[0]!;
    for (const p of waveform) if (Math.abs(p.angleDeg - a) < Math.abs(best.angleDeg - a)) best = p;
    out.push({ angle: a, mmf: Math.round(best.value * 100) / 100 });
  }
  return out;
}

export function MmfCharts({ waveform, mmf }: { waveform: MmfPoint[]; mmf: MmfSpectrum }) {
  const bars = spectrumBars(mmf);
  const wave = waveform.map((p) => ({ angle: Math.round(p.angleDeg * 100) / 100, mmf: Math.round(p.value * 1000) / 1000 }));
  const samples = waveformSamples(waveform);
  const peak = wave.reduce((m, p) => Math.max(m, Math.abs(p.mmf)), 0);
  const strongest = bars.filter((b) => b.order !== '1' && b.direction !== 'cancelled').sort((x, y) => y.percent - x.percent)[0];
  const waveName = `Line chart of the MMF round the air gap from 0 to 360 degrees; peak ${peak.toFixed(2)} ampere-turns per ampere. The table of values follows.`;
  const barName = `Bar chart of the space harmonics, percent of the working wave${strongest ? `; the largest other order is ${strongest.order} at ${strongest.percent.toFixed(1)} %, ${WORD[strongest.direction]}` : ''}. The table below lists every order.`;
  return (
    <div className="mmf-charts">
      <figure aria-labelledby="mmf-wave-cap">
        <figcaption id="mmf-wave-cap">
          <strong>MMF round the air gap</strong> at the instant phase A current is at its peak (ampere-turns per ampere of coil current).
        </figcaption>
        <div className="chart-box" role="img" aria-label={waveName}>
          <ResponsiveContainer width="100%" height={220}>
            <LineChart data={wave} margin={{ top: 8, right: 12, bottom: 22, left: 4 }} accessibilityLayer={false}>
              <CartesianGrid strokeDasharray="3 3" stroke="#d5dae1" />
              <XAxis
                dataKey="angle"
                type="number"
                domain={[0, 360]}
                ticks={[0, 45, 90, 135, 180, 225, 270, 315, 360]}
                label={{ value: 'Mechanical angle from slot 1 (°)', position: 'insideBottom', offset: -12 }}
              />
              <YAxis width={48} />
              <Tooltip formatter={(v) => [`${String(v)} A-turns/A`, 'MMF']} labelFormatter={(l) => `${String(l)}°`} />
              <Line type="linear" dataKey="mmf" stroke="#1d2430" strokeWidth={1.6} dot={false} isAnimationActive={false} />
            </LineChart>
          </ResponsiveContainer>
        </div>
        <details className="no-print">
          <summary>MMF values as a table</summary>
          <table className="small compact spectrum-table">
            <caption className="sr-only">MMF round the air gap every 15 degrees</caption>
            <thead>
              <tr>
                <th scope="col" className="num">
                  Angle from slot 1 (°)
                </th>
                <th scope="col" className="num">
                  MMF (A-turns/A)
                </th>
              </tr>
            </thead>
            <tbody>
              {samples.map((p) => (
                <tr key={p.angle}>
                  <td className="num">{p.angle}</td>
                  <td className="num">{p.mmf.toFixed(2)}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </details>
      </figure>
      <figure aria-labelledby="mmf-bars-cap">
        <figcaption id="mmf-bars-cap">
          <strong>Space harmonics</strong> of the three-phase MMF, % of the working wave: → forward, ← backward, × cancelled (each phase has
          it, the three together cancel it).
        </figcaption>
        <div className="chart-box" role="img" aria-label={barName}>
          <ResponsiveContainer width="100%" height={230}>
            <BarChart data={bars} margin={{ top: 22, right: 12, bottom: 22, left: 4 }} accessibilityLayer={false}>
              <defs>
                <pattern id="mmf-back" width="5" height="5" patternUnits="userSpaceOnUse" patternTransform="rotate(45)">
                  <rect width="5" height="5" fill="#fff" />
                  <line x1="0" y1="0" x2="0" y2="5" stroke="#1d2430" strokeWidth="2" />
                </pattern>
              </defs>
              <CartesianGrid strokeDasharray="3 3" stroke="#d5dae1" vertical={false} />
              <XAxis dataKey="order" label={{ value: 'Order ν (electrical)', position: 'insideBottom', offset: -12 }} />
              <YAxis width={40} scale="sqrt" domain={[0, 100]} ticks={[0, 1, 5, 20, 50, 100]} />
              <Tooltip
                formatter={(v, _n, item) => [
                  `${String(v)} % (${WORD[(item.payload as { direction: MmfDirection }).direction]}, ${(item.payload as { rpm: number }).rpm} rpm)`,
                  'Amplitude',
                ]}
              />
              <Bar
                dataKey="percent"
                isAnimationActive={false}
                stroke="#1d2430"
                shape={(props: unknown) => {
                  const p = props as { x: number; y: number; width: number; height: number; payload: { direction: MmfDirection } };
                  const fill =
                    p.payload.direction === 'forward' ? '#1d2430' : p.payload.direction === 'backward' ? 'url(#mmf-back)' : '#fff';
                  return <rect x={p.x} y={p.y} width={p.width} height={Math.max(p.height, 0)} fill={fill} stroke="#1d2430" />;
                }}
              >
                <LabelList dataKey="label" position="top" fontSize={10} />
              </Bar>
            </BarChart>
          </ResponsiveContainer>
        </div>
        <table className="small spectrum-table">
          <caption className="sr-only">Space harmonics: order, amplitude, direction, speed</caption>
          <thead>
            <tr>
              <th scope="col">Order</th>
              <th scope="col" className="num">
                % of working wave
              </th>
              <th scope="col">Direction</th>
              <th scope="col" className="num">
                Speed (rpm)
              </th>
            </tr>
          </thead>
          <tbody>
            {bars
              .filter((b) => Number(b.order) <= 13 || b.percent >= 1)
              .map((b) => (
                <tr key={b.order}>
                  <td>{b.order}</td>
                  <td className="num">{b.percent.toFixed(1)}</td>
                  <td>
                    {MARK[b.direction]} {WORD[b.direction]}
                  </td>
                  <td className="num">{b.direction === 'cancelled' ? '—' : b.rpm}</td>
                </tr>
              ))}
          </tbody>
        </table>
      </figure>
    </div>
  );
}
