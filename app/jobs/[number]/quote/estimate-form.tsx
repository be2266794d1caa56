'use client';

import { useMemo, useState, useTransition } from 'react';
import { useRouter } from 'next/navigation';
import { useFieldArray, useForm, useWatch } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import type { z } from 'zod';
import {
  estimateSaveSchema,
  LINE_KINDS,
  LINE_KIND_LABELS,
  REFERENCE_LABELS,
  type EstimateLineInput,
  type EstimateSaveInput,
} from '@/lib/quotes/quote-schema';
import { saveEstimate, sendQuote } from '@/lib/quotes/quote-actions';
import { liveTotals } from '@/lib/quotes/estimate-form-values';
import { basisPointsToPercent } from '@/lib/quotes/decimal-input';
import { formatMoney, type CurrencyCode } from '@/lib/quotes/money';
import type { TaxMode } from '@/lib/quotes/estimate-totals';
import { FIX_FIELDS_SUMMARY, showActionFailure } from '@/lib/errors/form-errors';
import { FormStatus } from '@/app/_components/form-status';

export interface EstimateDefaults {
  labourRate: string;
  taxRate: string;
}

interface Props {
  quoteId: string;
  quoteNumber: string;
  version: number;
  currency: CurrencyCode;
  taxMode: TaxMode;
  initial: Pick<EstimateSaveInput, 'discount' | 'notes' | 'lines'>;
  defaults: EstimateDefaults;
  /** Rewind material from the winding, as form lines, or why there is none. */
  rewind: { lines: EstimateLineInput[]; source: string } | { reason: string };
  canSend: boolean;
}

const blank = (kind: EstimateLineInput['kind'], d: EstimateDefaults): EstimateLineInput => ({
  kind,
  description: '',
  reference: '',
  quantity: kind === 'LABOUR' ? '1' : '1',
  unit: kind === 'LABOUR' ? 'h' : kind === 'MATERIAL' ? 'kg' : 'each',
  unitPrice: kind === 'LABOUR' ? d.labourRate : '',
  taxRate: d.taxRate,
});

/** The estimate: lines of labour, materials, parts, outside services and rewind material; totals as you type. */
export function EstimateForm({ quoteId, quoteNumber, version, currency, taxMode, initial, defaults, rewind, canSend }: Props) {
  const router = useRouter();
  const [pending, startTransition] = useTransition();
  const [base, setBase] = useState(version);
  const [summary, setSummary] = useState<{ tone: 'ok' | 'bad' | 'warn'; text: string } | null>(null);
  const {
    register,
    control,
    handleSubmit,
    setError,
    formState: { errors, isDirty },
    reset,
    getValues,
  } = useForm<EstimateSaveInput, unknown, z.output<typeof estimateSaveSchema>>({
    resolver: zodResolver(estimateSaveSchema),
    defaultValues: { quoteId, version, currency, ...initial },
  });
  const { fields, append, remove, move } = useFieldArray({ control, name: 'lines' });
  const lines = useWatch({ control, name: 'lines' });
  const discount = useWatch({ control, name: 'discount' });
  const totals = useMemo(() => liveTotals(lines ?? [], discount ?? '', currency, taxMode), [lines, discount, currency, taxMode]);
  const money = (minor: number) => formatMoney(minor, currency);
  const lineErr = (i: number, f: keyof EstimateLineInput) => errors.lines?.[i]?.[f]?.message;

  const onSubmit = handleSubmit(
    // The action parses the text as typed (the same schema), so the raw form values are sent.
    () =>
      startTransition(async () => {
        const r = await saveEstimate({ ...getValues(), version: base });
        if (r.ok) {
          setBase(r.data.version);
          reset({ ...getValues(), version: r.data.version });
          setSummary({ tone: 'ok', text: r.message ?? 'Saved.' });
          router.refresh();
        } else showActionFailure(r, { setError, setSummary, onStale: () => router.refresh() });
      }),
    () => setSummary({ tone: 'bad', text: FIX_FIELDS_SUMMARY }),
  );

  const send = () =>
    startTransition(async () => {
      const r = await sendQuote({ quoteId, version: base });
      if (r.ok) {
        setSummary({ tone: 'ok', text: r.message ?? 'Sent.' });
        router.refresh();
      } else setSummary({ tone: 'bad', text: r.message });
    });

  return (
    <form onSubmit={onSubmit} noValidate aria-label={`Estimate ${quoteNumber}`} className="estimate">
      <FormStatus message={summary?.text} tone={summary?.tone ?? 'ok'} />
      <div className="table-scroll">
        <table className="estimate-lines">
          <caption className="sr-only">Estimate lines</caption>
          <thead>
            <tr>
              <th scope="col">Kind</th>
              <th scope="col">Description</th>
              <th scope="col">Person, trade or designation</th>
              <th scope="col">Quantity</th>
              <th scope="col">Unit</th>
              <th scope="col">Unit price ({currency})</th>
              <th scope="col">Tax %</th>
              <th scope="col" className="num">
                Amount
              </th>
              <th scope="col">
                <span className="sr-only">Order and remove</span>
              </th>
            </tr>
          </thead>
          <tbody>
            {fields.map((f, i) => {
              const kind = lines?.[i]?.kind ?? f.kind;
              const n = i + 1;
              const cell = (name: keyof EstimateLineInput, label: string, props: { inputMode?: 'decimal'; size?: number } = {}) => {
                const err = lineErr(i, name);
                const id = `line-${i}-${name}`;
                return (
                  <td>
                    <input
                      id={id}
                      aria-label={`Line ${n} ${label}`}
                      aria-invalid={err ? true : undefined}
                      aria-describedby={err ? `${id}-error` : undefined}
                      {...props}
                      {...register(`lines.${i}.${name}`)}
                    />
                    {err && (
                      <p id={`${id}-error`} className="field-error">
                        {err}
                      </p>
                    )}
                  </td>
                );
              };
              return (
                <tr key={f.id}>
                  <td>
                    <select aria-label={`Line ${n} kind`} {...register(`lines.${i}.kind`)}>
                      {LINE_KINDS.map((k) => (
                        <option key={k} value={k}>
                          {LINE_KIND_LABELS[k]}
                        </option>
                      ))}
                    </select>
                  </td>
                  {cell('description', 'description', { size: 28 })}
                  {cell('reference', REFERENCE_LABELS[kind].toLowerCase(), { size: 16 })}
                  {cell('quantity', 'quantity', { inputMode: 'decimal', size: 6 })}
                  {cell('unit', 'unit', { size: 4 })}
                  {cell('unitPrice', 'unit price', { inputMode: 'decimal', size: 8 })}
                  {cell('taxRate', 'tax rate', { inputMode: 'decimal', size: 4 })}
                  <td className="num" aria-label={`Line ${n} amount`}>
                    {money(totals.lines[i]?.netMinor ?? 0)}
                  </td>
                  <td className="nowrap">
                    <button
                      type="button"
                      className="btn quiet small"
                      aria-label={`Move line ${n} up`}
                      disabled={i === 0}
                      onClick={() => move(i, i - 1)}
                    >
                      ↑
                    </button>
                    <button type="button" className="btn quiet small" aria-label={`Remove line ${n}`} onClick={() => remove(i)}>
                      ✕
                    </button>
                  </td>
                </tr>
              );
            })}
            {fields.length === 0 && (
              <tr>
                <td colSpan={9} className="muted">
                  No lines yet: add labour, parts, materials or the rewind material below.
                </td>
              </tr>
            )}
          </tbody>
        </table>
      </div>
      <div className="row" style={{ marginTop: '0.5rem', flexWrap: 'wrap' }}>
        <button type="button" className="btn secondary" onClick={() => append(blank('LABOUR', defaults))}>
          Add labour
        </button>
        <button type="button" className="btn secondary" onClick={() => append(blank('PART', defaults))}>
          Add part
        </button>
        <button type="button" className="btn secondary" onClick={() => append(blank('MATERIAL', defaults))}>
          Add material
        </button>
        <button type="button" className="btn secondary" onClick={() => append(blank('SERVICE', defaults))}>
          Add outside service
        </button>
        {'lines' in rewind ? (
          <button type="button" className="btn secondary" onClick={() => append(rewind.lines)}>
            Add rewind material (from the {rewind.source})
          </button>
        ) : (
          <span className="small muted">Rewind material: {rewind.reason}</span>
        )}
      </div>

      <div className="grid" style={{ gridTemplateColumns: 'repeat(auto-fit, minmax(260px, 1fr))', marginTop: '1rem' }}>
        <div>
          <label htmlFor="estimate-discount">
            Discount on the whole estimate <span className="unit">(%)</span>
          </label>
          <input
            id="estimate-discount"
            inputMode="decimal"
            aria-invalid={errors.discount ? true : undefined}
            aria-describedby={errors.discount ? 'estimate-discount-error' : undefined}
            {...register('discount')}
          />
          {errors.discount && (
            <p id="estimate-discount-error" className="field-error">
              {errors.discount.message}
            </p>
          )}
          <label htmlFor="estimate-notes">
            Notes printed on the quote <span className="unit">(optional)</span>
          </label>
          <textarea id="estimate-notes" rows={3} {...register('notes')} />
          {errors.notes && <p className="field-error">{errors.notes.message}</p>}
        </div>
        <dl className="dl totals" aria-label="Estimate totals" aria-live="polite">
          <dt>Subtotal</dt>
          <dd data-total="subtotal">{money(totals.subtotalMinor)}</dd>
          {totals.discountMinor !== 0 && (
            <>
              <dt>Discount</dt>
              <dd>−{money(totals.discountMinor)}</dd>
            </>
          )}
          {totals.bands
            .filter((b) => b.rateBp > 0)
            .map((b) => (
              <span key={b.rateBp} style={{ display: 'contents' }}>
                <dt>
                  Tax {basisPointsToPercent(b.rateBp)} %{taxMode === 'PER_LINE' ? ' (per line)' : ''}
                </dt>
                <dd>{money(b.taxMinor)}</dd>
              </span>
            ))}
          <dt>
            <strong>Total</strong>
          </dt>
          <dd data-total="total">
            <strong>{money(totals.totalMinor)}</strong>
          </dd>
        </dl>
      </div>

      <div className="row" style={{ marginTop: '0.75rem' }}>
        <button className="btn" type="submit" disabled={pending}>
          {pending ? 'Saving…' : 'Save estimate'}
        </button>
        {canSend && (
          <button
            type="button"
            className="btn secondary"
            disabled={pending || isDirty || fields.length === 0}
            onClick={send}
            aria-describedby="send-hint"
          >
            Send quote {quoteNumber}
          </button>
        )}
      </div>
      {canSend && (
        <p id="send-hint" className="hint">
          Save first. Sending freezes this revision with the shop’s terms and a validity date; a later change is a new revision.
        </p>
      )}
    </form>
  );
}
