import { requirePageUser } from '@/lib/auth/guard';
import { can } from '@/lib/auth/permissions';
import { DEFAULT_REDESIGN_LIMITS } from '@/lib/engine/redesign/from-sheet';
import { mmToInches } from '@/lib/engine/units';
import { fmt } from '@/lib/presentation/format';
import { limitsToForm } from '@/lib/redesign/redesign-schema';
import { getShopLimits } from '@/lib/settings/settings-queries';
import { readDisplaySettings } from '@/lib/settings/display-settings';
import { DATE_FORMAT_LABELS, DATE_FORMATS, serverTimeZone } from '@/lib/presentation/format';
import { DisplaySettingsForm } from './display-settings-form';
import { listStock } from '@/lib/stock/stock-queries';
import { AddStockForm, RemoveStockButton } from './stock-forms';
import { SettingsForm } from './settings-form';
import { BenchSettingsForm } from './bench-settings-form';
import { getBenchPackSettings } from '@/lib/bench-pack/bench-settings';
import { mm2ToCircularMils } from '@/lib/engine/units';

export const metadata = { title: 'Wire stock and shop limits' };

/** The wire sizes on hand (the redesign search picks only from these) and the shop's redesign limits. */
export default async function StockPage() {
  const user = await requirePageUser('stock.manage');
  const [stock, settings, bench, display] = await Promise.all([
    listStock(),
    getShopLimits(),
    getBenchPackSettings(),
    readDisplaySettings(),
  ]);
  const dateFormat = DATE_FORMATS.find((f) => f === display.dateFormat) ?? 'iso';
  const l = settings.limits;
  const mayEditSettings = can(user.role, 'settings.manage');
  return (
    <>
      <h1>Wire stock and shop limits</h1>
      <section className="card" aria-labelledby="stock-h">
        <h2 id="stock-h">Sizes on hand ({stock.length})</h2>
        <p className="muted small">
          The redesign search uses only these sizes. Approving a redesign reserves its wire (as wound, before the allowance for leads and
          waste); approving a later revision of the same job releases it. Insulated diameters are typical for the enamel grade (an
          approximation): measure a sample when the fill is tight.
        </p>
        <AddStockForm />
        <div style={{ overflowX: 'auto' }}>
          <table aria-label="Wire sizes on hand">
            <thead>
              <tr>
                <th scope="col">Size</th>
                <th scope="col">Grade</th>
                <th scope="col" className="num">
                  Bare
                </th>
                <th scope="col" className="num">
                  Insulated (typ.)
                </th>
                <th scope="col" className="num">
                  Area
                </th>
                <th scope="col" className="num">
                  On hand
                </th>
                <th scope="col">Reserved for approved redesigns</th>
                <th scope="col">Note</th>
                <th scope="col">
                  <span className="sr-only">Remove</span>
                </th>
              </tr>
            </thead>
            <tbody>
              {stock.map((s) => (
                <tr key={s.id}>
                  <th scope="row">{s.wire?.label ?? `${s.standard} ${s.size}`}</th>
                  <td>
                    {s.enamelGrade}
                    {s.standard === 'awg' ? ` (${['single', 'heavy', 'triple'][s.enamelGrade - 1]} build)` : ''}
                  </td>
                  <td className="num">{s.wire ? `${s.wire.bareMm.toFixed(3)} mm (${mmToInches(s.wire.bareMm).toFixed(4)} in)` : '—'}</td>
                  <td className="num">{s.wire ? `${s.wire.overallMm.toFixed(3)} mm` : '—'}</td>
                  <td className="num">
                    {s.wire ? `${s.wire.areaMm2.toFixed(4)} mm² (${fmt.num(mm2ToCircularMils(s.wire.areaMm2), 0)} CM)` : '—'}
                  </td>
                  <td className="num">
                    {fmt.num(s.quantityKg, 1, 'kg')}
                    {s.quantityKg !== null && s.reservedKg > 0 ? (
                      <>
                        <br />
                        <span className="small">{fmt.num(Math.max(0, s.quantityKg - s.reservedKg), 1, 'kg')} free</span>
                      </>
                    ) : null}
                  </td>
                  <td className="small" data-testid={`reserved-${s.size}`}>
                    {s.reservations.length === 0
                      ? '—'
                      : s.reservations.map((x) => (
                          <span key={`${x.jobNumber}-${x.revision}`}>
                            {x.kg.toFixed(2)} kg · job {x.jobNumber} revision {x.revision}
                            <br />
                          </span>
                        ))}
                  </td>
                  <td>{s.note ?? ''}</td>
                  <td>
                    <RemoveStockButton id={s.id} label={s.wire?.label ?? s.size} />
                  </td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      </section>
      <section className="card" aria-labelledby="limits-h">
        <h2 id="limits-h">Redesign limits</h2>
        <p className="muted small">
          Defaults for every redesign request (the engineer may change them per job). Starting values: flux densities +5 % / −10 % of the
          original (yoke −50 %), a cautious shop habit; current density +5 % and at most 6 A/mm² (textbook stator ranges 3–5 A/mm², 3–8 for
          totally enclosed machines); insulated wire at most 60 % of the gross slot area (shop practice); up to 10 wires in hand, 3 sizes
          within a diameter ratio of 1.3 (shop practice).{' '}
          {settings.updatedAt ? `Last saved ${fmt.dateTime(settings.updatedAt)}.` : 'Not saved yet: the starting values apply.'}
        </p>
        {mayEditSettings ? (
          <SettingsForm version={settings.version} defaults={limitsToForm(l)} starting={limitsToForm(DEFAULT_REDESIGN_LIMITS)} />
        ) : (
          <dl className="dl">
            <dt>Gap / tooth / yoke</dt>
            <dd>
              +{(l.gap.over * 100).toFixed(1)}/−{(l.gap.under * 100).toFixed(1)} % · +{(l.tooth.over * 100).toFixed(1)}/−
              {(l.tooth.under * 100).toFixed(1)} % · +{(l.yoke.over * 100).toFixed(1)}/−{(l.yoke.under * 100).toFixed(1)} %
            </dd>
            <dt>Current density</dt>
            <dd>
              +{(l.currentDensityRise * 100).toFixed(1)} %, at most {l.currentDensityMaxAPerMm2} A/mm²
            </dd>
            <dt>Slot fill</dt>
            <dd>at most {(l.slotFillMax * 100).toFixed(1)} % of the gross slot area</dd>
            <dt>Wires in hand</dt>
            <dd>
              up to {l.maxStrandsInHand}, {l.maxWireSizes} size(s), diameter ratio ≤ {l.mixedSizeRatioMax}
            </dd>
            <dt>Changed by</dt>
            <dd>an administrator</dd>
          </dl>
        )}
      </section>
      <section className="card" aria-labelledby="bench-h">
        <h2 id="bench-h">Bench pack</h2>
        <p className="muted small">
          The winder’s bench pack lists the wire to draw: the copper weight of the winding plus this allowance for leads, jumpers and waste
          (starting value 10 %, shop practice), beside the stock on hand. Lead marking: IEC 60034-8 or NEMA MG 1 Part 2; the winder can
          switch on the pack itself.
        </p>
        {mayEditSettings ? (
          <BenchSettingsForm
            version={bench.version}
            allowancePercent={Math.round(bench.wireAllowance * 1000) / 10}
            leadConvention={bench.leadConvention}
          />
        ) : (
          <dl className="dl">
            <dt>Allowance</dt>
            <dd>{(bench.wireAllowance * 100).toFixed(1)} % for leads, jumpers and waste</dd>
            <dt>Lead marking</dt>
            <dd>{bench.leadConvention === 'nema' ? 'NEMA MG 1 Part 2' : 'IEC 60034-8'}</dd>
          </dl>
        )}
      </section>
      <section className="card" aria-labelledby="dates-h">
        <h2 id="dates-h">Dates and times</h2>
        <p className="muted small">
          One time zone and one date format for every screen, print view and PDF (times are written 24-hour with the zone&apos;s name).
        </p>
        {mayEditSettings ? (
          <DisplaySettingsForm
            version={display.version}
            timeZone={display.timeZone}
            dateFormat={dateFormat}
            serverZone={serverTimeZone()}
            zones={Intl.supportedValuesOf('timeZone')}
          />
        ) : (
          <dl className="dl">
            <dt>Time zone</dt>
            <dd>{display.timeZone ?? `${serverTimeZone()} (the server's)`}</dd>
            <dt>Date format</dt>
            <dd>{DATE_FORMAT_LABELS[dateFormat]}</dd>
          </dl>
        )}
      </section>
    </>
  );
}
