/**
 * The rating a motor leaves the shop with, which every final-test verdict is judged against: the frozen
 * approved redesign's proposed nameplate when a revision is approved (the motor was rewound to it), else
 * the nameplate as received. Pure, so the defaults, the server's check on save and the tests agree.
 */
import { polesFromSpeed } from '@/lib/engine/speed';

export interface NameplateRating {
  ratedVoltageV: number | null;
  frequencyHz: number | null;
  speedRpm: number | null;
  currentA: number | null;
  outputKw: number | null;
  connection: string | null;
}

/** The approved redesign's proposed nameplate (see ProposedNameplate in lib/engine/redesign/report.ts). */
export interface RedesignRating {
  revision: number;
  nameplate: {
    lineVoltageV: number;
    connection: string;
    frequencyHz: number;
    poles: number;
    speedRpm: number | null;
    currentA: number | null;
    outputKw: number | null;
  };
}

export interface AsRepairedRating {
  source: 'nameplate' | 'redesign';
  redesignRevision?: number;
  ratedVoltageV?: number;
  frequencyHz?: number;
  poles?: number;
  ratedCurrentA?: number;
  ratedSpeedRpm?: number;
  outputKw?: number;
  connection?: string;
}

const given = <T>(v: T | null | undefined): T | undefined => (v === null ? undefined : v);

export function asRepairedRating(plate: NameplateRating, redesign: RedesignRating | null): AsRepairedRating {
  if (redesign) {
    const n = redesign.nameplate;
    return {
      source: 'redesign',
      redesignRevision: redesign.revision,
      ratedVoltageV: n.lineVoltageV,
      frequencyHz: n.frequencyHz,
      poles: n.poles,
      ratedCurrentA: given(n.currentA),
      ratedSpeedRpm: given(n.speedRpm),
      outputKw: given(n.outputKw),
      connection: n.connection,
    };
  }
  const poles = plate.frequencyHz && plate.speedRpm ? polesFromSpeed(plate.frequencyHz, plate.speedRpm) : null;
  return {
    source: 'nameplate',
    ratedVoltageV: given(plate.ratedVoltageV),
    frequencyHz: given(plate.frequencyHz),
    poles: poles?.ok ? poles.value : undefined,
    ratedCurrentA: given(plate.currentA),
    ratedSpeedRpm: given(plate.speedRpm),
    outputKw: given(plate.outputKw),
    connection: given(plate.connection),
  };
}

/** Where the rating came from, as the form's hint says it. */
export function ratingSourceText(r: AsRepairedRating): string {
  return r.source === 'redesign' ? `from the approved redesign, revision ${r.redesignRevision}` : 'from the nameplate as received';
}
