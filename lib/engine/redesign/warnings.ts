/**
 * The cautions a careful engineer gives with a redesign, in our own words (docs/engineering/redesign.md and safety-notices.md). Every
 * redesign carries the review and certification notices; the others depend on what changed.
 */
import { synchronousSpeedRpm } from '../speed';
import type { Candidate, RedesignOriginal, RedesignTarget } from './types';

/** One caution: what it is about and what to do. */
export interface RedesignWarning {
  topic: 'poles' | 'speed' | 'frequency' | 'connection' | 'harmonics' | 'voltage' | 'certification' | 'review' | 'codes';
  text: string;
}

/** Line voltage above which the insulation system needs a fresh look on a rewind [common practice]. */
const INSULATION_CHECK_ABOVE_V = 600;

/** Cautions for one candidate on one target. */
export function redesignWarnings(original: RedesignOriginal, target: RedesignTarget, candidate: Candidate | null): RedesignWarning[] {
  const out: RedesignWarning[] = [];
  const ow = original.winding;
  const nOld = synchronousSpeedRpm(original.supply.frequencyHz, ow.poles);
  const nNew = synchronousSpeedRpm(target.frequencyHz, target.poles);
  if (target.poles < ow.poles)
    out.push({
      topic: 'poles',
      text: `Fewer poles (${ow.poles} → ${target.poles}) put more flux through the back iron: the yoke risks saturation, magnetising current and heating. The yoke ratio${candidate ? ` here is ${candidate.ratios.yoke.toFixed(3)}` : ''}; check it against the core before anything else.`,
    });
  if (target.poles !== ow.poles)
    out.push({
      topic: 'poles',
      text: 'A pole change alters speed, torque, power factor, efficiency and starting; the stator/rotor slot combination may bring noise, cusps or crawling. An engineer must review it.',
    });
  if (Math.abs(nNew - nOld) > 1e-9)
    out.push({
      topic: 'speed',
      text: `Synchronous speed changes from ${nOld.toFixed(0)} to ${nNew.toFixed(0)} rpm: check the fan (its power rises roughly with the cube of speed), the bearings and their lubrication, the rotor balance and the driven load${nNew > nOld ? ', and that every rotating part is rated for the higher speed' : '; at lower speed the shaft fan cools less, so the output may need derating'}.`,
    });
  if (target.frequencyHz !== original.supply.frequencyHz)
    out.push({
      topic: 'frequency',
      text: `A frequency change (${original.supply.frequencyHz} → ${target.frequencyHz} Hz) changes speed and power together, and the iron losses with it; the figures assume the torque is kept.`,
    });
  const conn = candidate?.winding.connection ?? (target.connection === 'either' ? ow.connection : target.connection);
  if (conn !== ow.connection)
    out.push({
      topic: 'connection',
      text: `The connection changes (${ow.connection} → ${conn}). Star and delta differ by √3 in phase voltage: a winding made for star runs at 173 % flux if connected in delta, one made for delta at 58 % if connected in star. Re-mark the leads, check the terminal links and any star-delta starter.`,
    });
  if (candidate?.fractional)
    out.push({
      topic: 'harmonics',
      text: 'Fractional-slot winding: it carries even or sub-harmonic orders that cause extra noise, vibration and stray losses. Check the rotor slot combination and review the harmonic table.',
    });
  if (target.lineVoltageV > INSULATION_CHECK_ABOVE_V || target.lineVoltageV > original.supply.lineVoltageV * 1.2)
    out.push({
      topic: 'voltage',
      text: `At ${target.lineVoltageV} V check the insulation system for the new voltage: magnet wire grade, slot liner, phase separators, lead wire and terminal board; test voltages rise with the rating.`,
    });
  out.push({
    topic: 'certification',
    text: 'Hazardous-location (explosion-protected) and listed or certified motors may lose their certification when rewound to a different design: repair them only under the rules of IEC 60079-19 and the certifying body.',
  });
  out.push({
    topic: 'review',
    text: 'Every redesign must be reviewed and approved by a qualified person before winding, and the motor must carry a supplementary nameplate with the new data.',
  });
  out.push({
    topic: 'codes',
    text: 'This sheet is an aid to that review: local codes, the manufacturer’s data and licensed or qualified practice take precedence.',
  });
  return out;
}
