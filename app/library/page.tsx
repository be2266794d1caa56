import Link from 'next/link';
import { requirePageUser } from '@/lib/auth/guard';
import { can } from '@/lib/auth/permissions';
import { LIBRARY_DEFAULT_TOLERANCE, libraryQuerySchema, type LibraryQuery } from '@/lib/library/library-query-schema';
import { lengthToMm, mmToLength, type LengthUnit } from '@/lib/as-found/length-entry';
import { getLibrarySheets, searchLibrary, type LibrarySearch } from '@/lib/library/library-queries';
import { getLengthUnit } from '@/lib/as-found/as-found-queries';
import { fmt } from '@/lib/presentation/format';
import type { WindingSheet } from '@/lib/as-found/winding-sheet-schema';
import { UseForJob } from './use-for-job';
import { TableScroll } from '@/app/_components/table-scroll';
import '../jobs/[number]/as-found/sheet.css';
import { jobRoutes } from '@/lib/routes';
import { spansLabel, layoutLabel } from '@/lib/engine/notation';

export const metadata = { title: 'Winding library' };

/** The page's query in stored units: lengths converted from the user's unit once, here. */
function toSearch(q: LibraryQuery, unit: LengthUnit): LibrarySearch {
  const around = (v: number | undefined, tol: number) => (v === undefined ? undefined : { min: v - tol, max: v + tol });
  const pct = (v: number | undefined, p: number) => (v === undefined ? undefined : { min: v * (1 - p / 100), max: v * (1 + p / 100) });
  const bore = q.bore === undefined ? undefined : lengthToMm(q.bore, unit);
  const length = q.length === undefined ? undefined : lengthToMm(q.length, unit);
  const boreTol = q.boreTol === undefined ? LIBRARY_DEFAULT_TOLERANCE.boreMm : lengthToMm(q.boreTol, unit);
  const lengthTol = q.lengthTol === undefined ? LIBRARY_DEFAULT_TOLERANCE.lengthMm : lengthToMm(q.lengthTol, unit);
  const s: LibrarySearch = {
    target: { ...(bore !== undefined ? { boreMm: bore } : {}), ...(length !== undefined ? { coreLengthMm: length } : {}) },
  };
  if (q.slots !== undefined) s.slots = q.slots;
  if (q.poles !== undefined) s.poles = q.poles;
  const b = around(bore, boreTol);
  if (b) s.boreMm = b;
  const l = around(length, lengthTol);
  if (l) s.coreLengthMm = l;
  const kw = pct(q.kw, q.kwTolPct ?? LIBRARY_DEFAULT_TOLERANCE.kwPct);
  if (kw) s.outputKw = kw;
  const v = pct(q.volts, q.voltsTolPct ?? LIBRARY_DEFAULT_TOLERANCE.voltsPct);
  if (v) s.lineVoltageV = v;
  if (q.q) s.text = q.q;
  return s;
}

const COMPARE_ROWS: [string, (s: WindingSheet, u: LengthUnit) => string][] = [
  ['Slots / poles', (s) => `${s.core.slots} / ${s.supply.poles}`],
  ['Bore', (s, u) => `${mmToLength(s.core.boreMm, u)} ${u}`],
  ['Core length', (s, u) => `${mmToLength(s.core.coreLengthMm, u)} ${u}`],
  ['Outside diameter', (s, u) => `${mmToLength(s.core.outsideDiameterMm, u)} ${u}`],
  [
    'Slot depth × widths',
    (s, u) =>
      `${mmToLength(s.core.slotDepthMm, u)} × ${mmToLength(s.core.slotWidthTopMm, u)}/${mmToLength(s.core.slotWidthBottomMm, u)} ${u}`,
  ],
  ['Tooth width', (s, u) => `${mmToLength(s.core.toothWidthMm, u)} ${u}`],
  ['Layout', (s) => `${layoutLabel(s.winding)}`],
  ['Spans', (s) => spansLabel(s.winding.spans)],
  ['Turns per coil', (s) => s.winding.turnsPerCoil.join(' / ')],
  ['Circuits, connection', (s) => `${s.winding.parallelPaths} · ${s.winding.connection}`],
  ['Wires in hand', (s) => s.wires.map((w) => `${w.count} × ${w.standard === 'awg' ? `AWG ${w.size}` : `${w.size} mm`}`).join(' + ')],
  ['Mean turn length', (s, u) => (s.winding.meanTurnLengthMm === undefined ? '—' : `${mmToLength(s.winding.meanTurnLengthMm, u)} ${u}`)],
  ['Supply', (s) => `${s.supply.lineVoltageV} V ${s.supply.frequencyHz} Hz`],
  ['Output', (s) => fmt.power(s.supply.ratedOutputKw)],
  ['Class', (s) => s.insulation.thermalClass],
];

export default async function LibraryPage({ searchParams }: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const user = await requirePageUser('job.read');
  const q = libraryQuerySchema.parse(await searchParams);
  const unit = q.unit ?? (await getLengthUnit(user.id));
  const searched = [q.slots, q.poles, q.bore, q.length, q.kw, q.volts, q.q].some((v) => v !== undefined);
  const [result, compared] = await Promise.all([searched ? searchLibrary(toSearch(q, unit)) : null, getLibrarySheets(q.compare)]);
  const mayUse = q.forJob !== undefined && can(user.role, 'sheet.edit');
  const val = (v: number | string | undefined) => (v === undefined ? '' : String(v));
  const keep = Object.entries({
    slots: q.slots,
    poles: q.poles,
    bore: q.bore,
    boreTol: q.boreTol,
    length: q.length,
    lengthTol: q.lengthTol,
    kw: q.kw,
    volts: q.volts,
    q: q.q,
    forJob: q.forJob,
    unit,
  }).filter(([, v]) => v !== undefined) as [string, string | number][];

  return (
    <>
      <h1>Winding library</h1>
      <p className="muted">
        Every data sheet recorded in the shop. Find an earlier motor with the same core to rewind from
        {q.forJob ? ` — matches for job ${q.forJob}` : ''}.
      </p>
      <form method="get" className="card no-print" aria-label="Search the winding library">
        {q.forJob !== undefined && <input type="hidden" name="forJob" value={q.forJob} />}
        <input type="hidden" name="unit" value={unit} />
        <div className="grid">
          <div>
            <label htmlFor="l-slots">Stator slots</label>
            <input id="l-slots" name="slots" inputMode="numeric" defaultValue={val(q.slots)} />
          </div>
          <div>
            <label htmlFor="l-poles">Poles</label>
            <input id="l-poles" name="poles" inputMode="numeric" defaultValue={val(q.poles)} />
          </div>
          <div>
            <label htmlFor="l-bore">
              Bore <span className="unit">({unit})</span>
            </label>
            <input id="l-bore" name="bore" inputMode="decimal" defaultValue={val(q.bore)} />
          </div>
          <div>
            <label htmlFor="l-boreTol">
              Bore ± <span className="unit">({unit})</span>
            </label>
            <input
              id="l-boreTol"
              name="boreTol"
              inputMode="decimal"
              placeholder={String(mmToLength(LIBRARY_DEFAULT_TOLERANCE.boreMm, unit))}
              defaultValue={val(q.boreTol)}
            />
          </div>
          <div>
            <label htmlFor="l-length">
              Core length <span className="unit">({unit})</span>
            </label>
            <input id="l-length" name="length" inputMode="decimal" defaultValue={val(q.length)} />
          </div>
          <div>
            <label htmlFor="l-lengthTol">
              Core length ± <span className="unit">({unit})</span>
            </label>
            <input
              id="l-lengthTol"
              name="lengthTol"
              inputMode="decimal"
              placeholder={String(mmToLength(LIBRARY_DEFAULT_TOLERANCE.lengthMm, unit))}
              defaultValue={val(q.lengthTol)}
            />
          </div>
          <div>
            <label htmlFor="l-kw">
              Output <span className="unit">(kW, ±{LIBRARY_DEFAULT_TOLERANCE.kwPct} %)</span>
            </label>
            <input id="l-kw" name="kw" inputMode="decimal" defaultValue={val(q.kw)} />
          </div>
          <div>
            <label htmlFor="l-volts">
              Line voltage <span className="unit">(V, ±{LIBRARY_DEFAULT_TOLERANCE.voltsPct} %)</span>
            </label>
            <input id="l-volts" name="volts" inputMode="decimal" defaultValue={val(q.volts)} />
          </div>
          <div>
            <label htmlFor="l-q">Manufacturer or model</label>
            <input id="l-q" name="q" defaultValue={q.q ?? ''} />
          </div>
        </div>
        <p className="row" style={{ marginTop: '0.75rem' }}>
          <button className="btn" type="submit">
            Search
          </button>
          <Link href={`/library${q.forJob ? `?forJob=${q.forJob}` : ''}`}>Clear</Link>
          <span className="small muted">Lengths in {unit === 'mm' ? 'millimetres' : 'inches'} (your sheet setting).</span>
        </p>
      </form>

      {compared.length > 0 && (
        <section className="card" aria-labelledby="cmp-h">
          <h2 id="cmp-h">Side by side</h2>
          <TableScroll label="Sheets side by side">
            <table className="side-by-side">
              <caption className="sr-only">Sheets side by side; rows where they differ are marked “differs”</caption>
              <thead>
                <tr>
                  <th scope="col">Job</th>
                  {compared.map((c) => (
                    <th key={c.id} scope="col">
                      <Link href={jobRoutes(c.jobNumber).asFoundPrint}>Job {c.jobNumber}</Link>{' '}
                      <span className="muted">
                        {c.manufacturer} {c.model}
                      </span>
                    </th>
                  ))}
                </tr>
              </thead>
              <tbody>
                {COMPARE_ROWS.map(([label, f]) => {
                  const cells = compared.map((c) => f(c.sheet, unit));
                  const differ = new Set(cells).size > 1;
                  return (
                    <tr key={label} className={differ ? 'differs' : undefined}>
                      <th scope="row">
                        {label}
                        {differ && (
                          <>
                            {' '}
                            <span className="tag differs-tag">
                              <span aria-hidden="true">≠ </span>differs
                            </span>
                          </>
                        )}
                      </th>
                      {cells.map((v, i) => (
                        <td key={compared[i]!.id}>{v}</td>
                      ))}
                    </tr>
                  );
                })}
                {mayUse && (
                  <tr>
                    <th scope="row">Use</th>
                    {compared.map((c) => (
                      <td key={c.id}>
                        <UseForJob jobNumber={q.forJob!} sheetId={c.id} from={c.jobNumber} />
                      </td>
                    ))}
                  </tr>
                )}
              </tbody>
            </table>
          </TableScroll>
          <p className="small muted">Rows where the sheets differ are marked “≠ differs”, with a heavier left rule and shading.</p>
        </section>
      )}

      {result && (
        <section className="card" aria-labelledby="res-h">
          <h2 id="res-h">
            {result.rows.length === 0
              ? 'No matching sheets'
              : `${result.rows.length}${result.more ? '+' : ''} matching sheet${result.rows.length === 1 ? '' : 's'}`}
            {result.more ? ' (closest shown; narrow the search for more)' : ''}
          </h2>
          {result.rows.length > 0 && (
            <form method="get" aria-label="Compare sheets">
              {keep.map(([k, v]) => (
                <input key={k} type="hidden" name={k} value={String(v)} />
              ))}
              <TableScroll label="Matching sheets">
                <table>
                  <thead>
                    <tr>
                      <th scope="col">Compare</th>
                      <th scope="col">Job</th>
                      <th scope="col">Motor</th>
                      <th scope="col" className="num">
                        Slots
                      </th>
                      <th scope="col" className="num">
                        Poles
                      </th>
                      <th scope="col" className="num">
                        Bore ({unit})
                      </th>
                      <th scope="col" className="num">
                        Length ({unit})
                      </th>
                      <th scope="col" className="num">
                        Output
                      </th>
                      <th scope="col" className="num">
                        Supply
                      </th>
                      <th scope="col">Saved</th>
                      {mayUse && <th scope="col" />}
                    </tr>
                  </thead>
                  <tbody>
                    {result.rows.map((r) => (
                      <tr key={r.id}>
                        <td>
                          <label className="check">
                            <input
                              type="checkbox"
                              name="compare"
                              value={r.id}
                              defaultChecked={q.compare.includes(r.id)}
                              aria-label={`Compare job ${r.jobNumber}`}
                            />
                          </label>
                        </td>
                        <td>
                          <Link href={jobRoutes(r.jobNumber).asFoundPrint}>{r.jobNumber}</Link>
                        </td>
                        <td>
                          {r.manufacturer ?? '—'} {r.model ?? ''}
                        </td>
                        <td className="num">{r.slots}</td>
                        <td className="num">{r.poles}</td>
                        <td className="num">{mmToLength(r.boreMm, unit)}</td>
                        <td className="num">{mmToLength(r.coreLengthMm, unit)}</td>
                        <td className="num">{fmt.num(r.outputKw, 2, 'kW')}</td>
                        <td className="num">
                          {fmt.num(r.lineVoltageV, 0, 'V')} {fmt.num(r.frequencyHz, 0, 'Hz')}
                        </td>
                        <td>
                          {fmt.date(r.updatedAt)} · r{r.revision}
                        </td>
                        {mayUse && (
                          <td>
                            <UseForJob jobNumber={q.forJob!} sheetId={r.id} from={r.jobNumber} />
                          </td>
                        )}
                      </tr>
                    ))}
                  </tbody>
                </table>
              </TableScroll>
              <p className="row" style={{ marginTop: '0.5rem' }}>
                <button type="submit" className="btn secondary">
                  Compare selected (2–3)
                </button>
              </p>
            </form>
          )}
        </section>
      )}
      {!searched && compared.length === 0 && (
        <p className="muted">Search by any of the fields above; slots and poles with bore narrow it fastest.</p>
      )}
    </>
  );
}
