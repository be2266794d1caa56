'use client';

import { useState, useTransition } from 'react';
import { useRouter } from 'next/navigation';
import { DATE_FORMAT_LABELS, DATE_FORMATS, type DateFormat } from '@/lib/presentation/format';
import { saveShopDisplaySettings } from '@/lib/settings/settings-actions';
import { FormStatus } from '@/app/_components/form-status';

/** The shop's one time zone and date format (administrators only). Keeps what was typed on a refusal. */
export function DisplaySettingsForm({
  version,
  timeZone,
  dateFormat,
  serverZone,
  zones,
}: {
  version: number;
  timeZone: string | null;
  dateFormat: DateFormat;
  serverZone: string;
  zones: string[];
}) {
  const router = useRouter();
  const [pending, startTransition] = useTransition();
  const [base, setBase] = useState(version);
  const [zone, setZone] = useState(timeZone ?? '');
  const [format, setFormat] = useState<string>(dateFormat);
  const [summary, setSummary] = useState<{ tone: 'ok' | 'bad'; text: string } | null>(null);
  const [zoneError, setZoneError] = useState<string | undefined>();
  function submit(e: React.FormEvent) {
    e.preventDefault();
    startTransition(async () => {
      const r = await saveShopDisplaySettings({ version: base, timeZone: zone, dateFormat: format });
      if (r.ok) {
        setBase(r.data.version);
        setZoneError(undefined);
        setSummary({ tone: 'ok', text: r.message ?? 'Saved.' });
        router.refresh();
      } else {
        setZoneError(r.fieldErrors?.timeZone?.[0]);
        setSummary({ tone: 'bad', text: r.message });
        if (r.code === 'stale') router.refresh();
      }
    });
  }
  return (
    <form onSubmit={submit} noValidate aria-label="Dates and times" className="no-print">
      <FormStatus message={summary?.text} tone={summary?.tone ?? 'ok'} />
      <div className="grid">
        <div>
          <label htmlFor="display-timeZone">Time zone</label>
          <input
            id="display-timeZone"
            list="display-zones"
            value={zone}
            onChange={(e) => setZone(e.target.value)}
            placeholder={`${serverZone} (the server's)`}
            aria-invalid={zoneError ? true : undefined}
            aria-describedby={zoneError ? 'display-timeZone-error' : 'display-timeZone-hint'}
          />
          <datalist id="display-zones">
            {zones.map((z) => (
              <option key={z} value={z} />
            ))}
          </datalist>
          {zoneError ? (
            <div id="display-timeZone-error" className="field-error">
              {zoneError}
            </div>
          ) : (
            <div id="display-timeZone-hint" className="small muted">
              Leave blank for the server&apos;s zone ({serverZone}).
            </div>
          )}
        </div>
        <div>
          <label htmlFor="display-dateFormat">Date format</label>
          <select id="display-dateFormat" value={format} onChange={(e) => setFormat(e.target.value)}>
            {DATE_FORMATS.map((f) => (
              <option key={f} value={f}>
                {DATE_FORMAT_LABELS[f]}
              </option>
            ))}
          </select>
        </div>
      </div>
      <button className="btn" type="submit" disabled={pending} style={{ marginTop: '0.5rem' }}>
        {pending ? 'Saving…' : 'Save date settings'}
      </button>
    </form>
  );
}
