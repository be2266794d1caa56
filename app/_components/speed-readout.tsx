'use client';

import { polesFromSpeed, slip, synchronousSpeedRpm } from '@/lib/engine/speed';

/** Poles, synchronous speed and slip inferred from nameplate speed and frequency, shown as the user types. */
export function SpeedReadout({ frequencyHz, speedRpm }: { frequencyHz: unknown; speedRpm: unknown }) {
  const f = Number(frequencyHz);
  const n = Number(speedRpm);
  if (!(f > 0) || !(n > 0))
    return (
      <p className="hint" aria-live="polite">
        Enter frequency and speed to see the pole count.
      </p>
    );
  const poles = polesFromSpeed(f, n);
  if (!poles.ok)
    return (
      <p className="hint" aria-live="polite">
        {poles.error.message} {poles.error.hint}
      </p>
    );
  const ns = synchronousSpeedRpm(f, poles.value);
  return (
    <p className="hint" aria-live="polite" data-testid="speed-readout">
      <strong>{poles.value} poles</strong> · synchronous {ns.toFixed(0)} rpm · slip {(slip(ns, n) * 100).toFixed(2)} %
    </p>
  );
}
