'use client';

/**
 * The sections of the as-found sheet form: core, winding (with coil rows for concentric groups),
 * wires in hand, insulation, supply and rating, resistance readings, notes. Lengths show the user's unit.
 */
import { get, useFieldArray, useFormContext, useWatch, type FieldErrors } from 'react-hook-form';
import type { LengthUnit } from '@/lib/as-found/length-entry';
import { blankWire, type SheetFormValues } from '@/lib/as-found/as-found-form';
import { fieldId, NumField, Section, SelectField, TextField, useFieldError, useReadOnly } from './sheet-fields';
import { RowKeys, rowKeyHandler, ROW_KEYS } from './row-keys';

export function CoreSection({ unit }: { unit: LengthUnit }) {
  return (
    <Section id="sec-core" title="Stator core" note={`Lengths in ${unit === 'mm' ? 'millimetres' : 'inches'}; stored in millimetres.`}>
      <NumField name="core.boreMm" label="Bore" unit={unit} />
      <NumField name="core.coreLengthMm" label="Core length" unit={unit} />
      <NumField name="core.outsideDiameterMm" label="Core outside diameter" unit={unit} />
      <NumField name="core.slots" label="Stator slots" whole />
      <NumField name="core.slotDepthMm" label="Slot depth" unit={unit} />
      <NumField name="core.slotWidthTopMm" label="Slot width, top (bore end)" unit={unit} />
      <NumField name="core.slotWidthBottomMm" label="Slot width, bottom" unit={unit} />
      <NumField name="core.slotOpeningMm" label="Slot opening" unit={unit} />
      <NumField name="core.toothWidthMm" label="Tooth width" unit={unit} hint="Narrowest, or at 1/3 height from the narrow end." />
      <NumField name="core.stackingFactor" label="Stacking factor" hint="Typically 0.93–0.97." />
      <NumField name="core.ventDucts" label="Radial vent ducts" whole />
      <NumField name="core.ventDuctWidthMm" label="Vent duct width" unit={unit} />
      <NumField name="core.rotorSlots" label="Rotor slots (bars)" whole />
      <NumField name="core.airGapMm" label="Air gap, if measured" unit={unit} />
    </Section>
  );
}

function CoilRows() {
  const {
    control,
    register,
    formState: { errors },
  } = useFormContext<SheetFormValues>();
  const { fields, append, remove } = useFieldArray({ control, name: 'winding.coils' });
  const style = useWatch({ control, name: 'winding.style' });
  const coils = useWatch({ control, name: 'winding.coils' });
  const rootError = useFieldError('winding.coils.root');
  const readOnly = useReadOnly();
  const concentric = style === 'concentric';
  const canAdd = concentric && fields.length < 12;
  const add = () => append({ span: '', turns: '' }, { focusName: `winding.coils.${fields.length}.span` });
  const onKeyDown = rowKeyHandler({
    add: canAdd ? add : null,
    remove:
      concentric && fields.length > 1
        ? (i) => {
            remove(i);
            focusLater(fieldId(`winding.coils.${Math.max(0, i - 1)}.span`));
          }
        : null,
  });
  if (readOnly) {
    return (
      <div className="sf wide">
        <dt>{concentric ? 'Coils of one group, outside coil first' : 'Coil'}</dt>
        <dd className="ro-value">
          {coils.map((c, i) => `${concentric ? `coil ${i + 1}: ` : ''}span ${c.span || '—'}, ${c.turns || '—'} turns`).join('; ')}
        </dd>
      </div>
    );
  }
  return (
    <div
      className="wide coil-rows"
      role="group"
      aria-labelledby="coils-h"
      aria-describedby={concentric ? 'coil-keys' : undefined}
      onKeyDown={onKeyDown}
    >
      <p id="coils-h" className="label">
        {concentric ? 'Coils of one group, outside coil first' : 'Coil'}
      </p>
      <table className="compact">
        <thead>
          <tr>
            <th scope="col">{concentric ? 'Coil' : ''}</th>
            <th scope="col">Span (slots; “1–8” is 7)</th>
            <th scope="col">Turns per coil</th>
            <th />
          </tr>
        </thead>
        <tbody>
          {fields.map((f, i) => {
            const spanId = fieldId(`winding.coils.${i}.span`);
            const turnsId = fieldId(`winding.coils.${i}.turns`);
            return (
              <tr key={f.id} data-row={i}>
                <td>{concentric ? i + 1 : ''}</td>
                <td>
                  <label htmlFor={spanId} className="sr-only">
                    Span of coil {i + 1}
                  </label>
                  <input
                    id={spanId}
                    {...register(`winding.coils.${i}.span`)}
                    inputMode="numeric"
                    autoComplete="off"
                    aria-invalid={errorAt(errors, `winding.coils.${i}.span`) ? true : undefined}
                  />
                  <RowError name={`winding.coils.${i}.span`} message={errorAt(errors, `winding.coils.${i}.span`)} />
                </td>
                <td>
                  <label htmlFor={turnsId} className="sr-only">
                    Turns of coil {i + 1}
                  </label>
                  <input
                    id={turnsId}
                    {...register(`winding.coils.${i}.turns`)}
                    inputMode="numeric"
                    autoComplete="off"
                    aria-invalid={errorAt(errors, `winding.coils.${i}.turns`) ? true : undefined}
                  />
                  <RowError name={`winding.coils.${i}.turns`} message={errorAt(errors, `winding.coils.${i}.turns`)} />
                </td>
                <td>
                  {concentric && fields.length > 1 && (
                    <button type="button" className="btn quiet small-btn" onClick={() => remove(i)} aria-label={`Remove coil ${i + 1}`}>
                      Remove
                    </button>
                  )}
                </td>
              </tr>
            );
          })}
        </tbody>
      </table>
      {canAdd && (
        <button type="button" className="btn quiet small-btn" onClick={add} aria-keyshortcuts={ROW_KEYS.add.aria}>
          Add a coil to the group
        </button>
      )}
      {concentric && <RowKeys id="coil-keys" what="a coil to the group" />}
      {rootError && (
        <p className="field-error" id="f-winding-coils-error">
          {rootError}
        </p>
      )}
    </div>
  );
}

const errorAt = (errors: FieldErrors<SheetFormValues>, name: string): string | undefined =>
  (get(errors, name) as { message?: string } | undefined)?.message;
function RowError({ message, name }: { message: string | undefined; name: string }) {
  return message ? (
    <p className="field-error" id={`${fieldId(name)}-error`}>
      {message}
    </p>
  ) : null;
}

export function WindingSection({ unit }: { unit: LengthUnit }) {
  const { control } = useFormContext<SheetFormValues>();
  const layers = useWatch({ control, name: 'winding.layers' });
  return (
    <Section id="sec-winding" title="Winding as found">
      <SelectField
        name="winding.layers"
        label="Layers"
        options={[
          ['2', 'Double layer (2 sides per slot)'],
          ['1', 'Single layer'],
        ]}
      />
      <SelectField
        name="winding.style"
        label="Coil style"
        options={[
          ['lap', 'Lap (all coils one span)'],
          ['concentric', 'Concentric (nested coils)'],
        ]}
      />
      {layers === '1' && (
        <SelectField
          name="winding.singleLayerCoiling"
          label="Single-layer coiling"
          options={[
            ['', '—'],
            ['half', 'Half-coiled (group per pole pair)'],
            ['whole', 'Whole-coiled (group per pole)'],
          ]}
        />
      )}
      <CoilRows />
      <NumField name="winding.coilsPerGroup" label="Coils per group" whole />
      <NumField name="winding.groups" label="Groups (total)" whole />
      <NumField name="winding.parallelPaths" label="Parallel circuits" whole />
      <SelectField
        name="winding.connection"
        label="Connection"
        options={[
          ['', '—'],
          ['star', 'Star (Y)'],
          ['delta', 'Delta (Δ)'],
        ]}
      />
      <NumField name="winding.leads" label="Leads" whole />
      <TextField name="winding.leadMarkings" label="Lead markings" hint="e.g. U1 V1 W1 U2 V2 W2" />
      <NumField name="winding.meanTurnLengthMm" label="Mean length of turn" unit={unit} />
      <NumField name="winding.coilExtensionMm" label="Coil extension beyond core" unit={unit} />
      <NumField name="winding.copperWeightKg" label="Copper weight" unit="kg" hint="1 kg = 2.205 lb" />
      <TextField name="winding.jumperNotes" label="Jumper pattern notes" long />
    </Section>
  );
}

const STANDARD_LABELS: Record<string, string> = { metric: 'Metric (mm)', awg: 'AWG' };
const GRADE_LABELS: Record<string, string> = { '1': '1 (single build)', '2': '2 (heavy)', '3': '3' };

/** Wires in hand as plain rows, for a reader who may not edit the sheet. */
function WireRowsReadOnly() {
  const { control } = useFormContext<SheetFormValues>();
  const wires = useWatch({ control, name: 'wires' });
  return (
    <table className="compact wires">
      <caption className="sr-only">Wires in hand</caption>
      <thead>
        <tr>
          <th scope="col">#</th>
          <th scope="col">Standard</th>
          <th scope="col">Size (AWG, or bare mm)</th>
          <th scope="col">Wires in hand</th>
          <th scope="col">Enamel grade</th>
        </tr>
      </thead>
      <tbody>
        {wires.map((w, i) => (
          <tr key={i}>
            <td>{i + 1}</td>
            <td>{STANDARD_LABELS[w.standard] ?? w.standard}</td>
            <td>{w.size || '—'}</td>
            <td>{w.count || '—'}</td>
            <td>{GRADE_LABELS[w.enamelGrade] ?? w.enamelGrade}</td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}

/** Moves focus once React has drawn the rows again. */
function focusLater(id: string): void {
  requestAnimationFrame(() => document.getElementById(id)?.focus());
}

export function WiresSection() {
  const {
    control,
    register,
    formState: { errors },
  } = useFormContext<SheetFormValues>();
  const { fields, append, remove } = useFieldArray({ control, name: 'wires' });
  const rootError = errorAt(errors, 'wires.root') ?? errorAt(errors, 'wires');
  const readOnly = useReadOnly();
  const add = () => append(blankWire(), { focusName: `wires.${fields.length}.size` });
  const onKeyDown = rowKeyHandler({
    add: fields.length < 4 ? add : null,
    remove:
      fields.length > 1
        ? (i) => {
            remove(i);
            focusLater(fieldId(`wires.${Math.max(0, i - 1)}.size`));
          }
        : null,
  });
  if (readOnly) {
    return (
      <fieldset className="sheet-section">
        <legend>Wires in hand</legend>
        <WireRowsReadOnly />
      </fieldset>
    );
  }
  return (
    <fieldset className="sheet-section" onKeyDown={onKeyDown} aria-describedby="wire-keys">
      <legend>Wires in hand</legend>
      <p className="hint">One row per wire size; “count” is how many wires of that size are wound together in hand.</p>
      <table className="compact wires">
        <thead>
          <tr>
            <th scope="col">#</th>
            <th scope="col">Standard</th>
            <th scope="col">Size (AWG, or bare mm)</th>
            <th scope="col">Wires in hand</th>
            <th scope="col">Enamel grade</th>
            <th />
          </tr>
        </thead>
        <tbody>
          {fields.map((f, i) => (
            <tr key={f.id} data-row={i}>
              <td>{i + 1}</td>
              <td>
                <label htmlFor={fieldId(`wires.${i}.standard`)} className="sr-only">
                  Wire {i + 1} standard
                </label>
                <select id={fieldId(`wires.${i}.standard`)} {...register(`wires.${i}.standard`)}>
                  <option value="metric">Metric (mm)</option>
                  <option value="awg">AWG</option>
                </select>
              </td>
              <td>
                <label htmlFor={fieldId(`wires.${i}.size`)} className="sr-only">
                  Wire {i + 1} size
                </label>
                <input
                  id={fieldId(`wires.${i}.size`)}
                  {...register(`wires.${i}.size`)}
                  autoComplete="off"
                  aria-invalid={errorAt(errors, `wires.${i}.size`) ? true : undefined}
                  aria-describedby={`${fieldId(`wires.${i}.size`)}-error`}
                />
                <RowError name={`wires.${i}.size`} message={errorAt(errors, `wires.${i}.size`)} />
              </td>
              <td>
                <label htmlFor={fieldId(`wires.${i}.count`)} className="sr-only">
                  Wire {i + 1} count in hand
                </label>
                <input
                  id={fieldId(`wires.${i}.count`)}
                  {...register(`wires.${i}.count`)}
                  inputMode="numeric"
                  autoComplete="off"
                  aria-invalid={errorAt(errors, `wires.${i}.count`) ? true : undefined}
                />
                <RowError name={`wires.${i}.count`} message={errorAt(errors, `wires.${i}.count`)} />
              </td>
              <td>
                <label htmlFor={fieldId(`wires.${i}.enamelGrade`)} className="sr-only">
                  Wire {i + 1} enamel grade
                </label>
                <select id={fieldId(`wires.${i}.enamelGrade`)} {...register(`wires.${i}.enamelGrade`)}>
                  <option value="1">1 (single build)</option>
                  <option value="2">2 (heavy)</option>
                  <option value="3">3</option>
                </select>
              </td>
              <td>
                {fields.length > 1 && (
                  <button type="button" className="btn quiet small-btn" onClick={() => remove(i)} aria-label={`Remove wire ${i + 1}`}>
                    Remove
                  </button>
                )}
              </td>
            </tr>
          ))}
        </tbody>
      </table>
      {fields.length < 4 && (
        <button type="button" className="btn quiet small-btn" onClick={add} aria-keyshortcuts={ROW_KEYS.add.aria}>
          Add a wire size
        </button>
      )}
      <RowKeys id="wire-keys" what="a wire size" />
      {rootError && <p className="field-error">{rootError}</p>}
    </fieldset>
  );
}

export function SupplySection() {
  return (
    <Section id="sec-supply" title="Supply and rating" note="From the nameplate; poles from the rated speed.">
      <NumField name="supply.lineVoltageV" label="Line voltage" unit="V" />
      <NumField name="supply.frequencyHz" label="Frequency" unit="Hz" />
      <NumField name="supply.poles" label="Poles" whole />
      <NumField name="supply.ratedCurrentA" label="Rated current" unit="A" />
      <NumField name="supply.ratedOutputKw" label="Rated output" unit="kW" hint="1 hp = 0.7457 kW" />
    </Section>
  );
}

export function InsulationSection() {
  return (
    <Section id="sec-ins" title="Insulation">
      <SelectField
        name="insulation.thermalClass"
        label="Insulation class"
        options={[
          ['', '—'],
          ['A', 'A (105 °C)'],
          ['B', 'B (130 °C)'],
          ['F', 'F (155 °C)'],
          ['H', 'H (180 °C)'],
        ]}
      />
      <TextField name="insulation.slotLiner" label="Slot liner" hint="Material and thickness" />
      <TextField name="insulation.wedges" label="Wedges" />
      <TextField name="insulation.varnish" label="Varnish" />
    </Section>
  );
}

export function ResistanceSection() {
  return (
    <Section id="sec-res" title="Measured resistance" note="Three readings before stripping, with the winding temperature.">
      <NumField name="resistance.readings.0" label="Reading 1 (U–V or U1–U2)" unit="Ω" />
      <NumField name="resistance.readings.1" label="Reading 2 (V–W or V1–V2)" unit="Ω" />
      <NumField name="resistance.readings.2" label="Reading 3 (W–U or W1–W2)" unit="Ω" />
      <NumField name="resistance.temperatureC" label="Winding temperature" unit="°C" />
      <SelectField
        name="resistance.between"
        label="Readings are"
        options={[
          ['line-to-line', 'Line to line'],
          ['phase', 'Per phase'],
        ]}
      />
    </Section>
  );
}

export function NotesSection() {
  return (
    <Section id="sec-notes" title="Notes">
      <TextField
        name="notes"
        label="Notes"
        long
        hint="Anything else the next winder needs: damage, repairs to the core, odd connections."
      />
    </Section>
  );
}
