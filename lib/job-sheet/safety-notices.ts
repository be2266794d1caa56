/**
 * Safety notices printed on every job sheet (PDF and print view) and the test-hazard cautions shown on the
 * final-tests screen. Written in Coilwright's own words; one module so every place says the same thing.
 * They are reminders, not a safety procedure: the closing statement defers to local codes, the
 * manufacturer's data and licensed or qualified practice.
 */

export interface SafetyNotice {
  /** Stable key, used by tests and as a React key. */
  id: string;
  title: string;
  text: string;
}

export const SAFETY_NOTICES: readonly SafetyNotice[] = [
  {
    id: 'isolation',
    title: 'Isolation and lockout',
    text:
      'Before anyone works on an installed motor, isolate every supply to it (including heaters, brakes and ' +
      'drive capacitors), lock and tag the isolation point, and prove the circuit dead with a tested voltage ' +
      'indicator. Reinstallation is the user’s responsibility and must follow the same procedure.',
  },
  {
    id: 'test-voltage',
    title: 'Test voltages and discharge',
    text:
      'Insulation resistance, high-potential and surge tests put voltages on the winding that can kill. Only ' +
      'trained people test, inside a barricaded area with warning signs, and nobody touches the motor or its ' +
      'leads while a test is on. After every DC test, discharge the winding to ground for at least as long as ' +
      'the voltage was applied (four times as long is a safe habit) and keep it grounded until it is connected ' +
      'or stored. A high-potential test is done only after satisfactory IR and PI readings on a clean, dry ' +
      'winding; repeat tests are made at a reduced level. A surge test can break down insulation that is ' +
      'already weak.',
  },
  {
    id: 'lifting',
    title: 'Lifting',
    text:
      'Lift the motor only by its rated lifting points, with slings and hooks rated for the whole weight. An ' +
      'eyebolt on the motor is meant for the motor alone, never for the motor with a pump, gearbox or base ' +
      'attached. Never stand under a suspended load.',
  },
  {
    id: 'burn-off',
    title: 'Burn-off oven, fumes and fire',
    text:
      'Stators are stripped in a temperature-controlled burn-off oven kept below the limit that would damage ' +
      'the core laminations’ insulation, with its water-spray or other fire control working. Burning varnish ' +
      'and insulation gives off harmful fumes: vent the oven outside, keep people away from the exhaust, and ' +
      'keep extinguishers at hand. Never strip a winding with an open flame.',
  },
  {
    id: 'run-test',
    title: 'Run test guarding',
    text:
      'Secure the motor before it is run. Remove keys from the shaft or tie them in, fit guards over rotating ' +
      'parts, keep loose clothing and tools clear, and keep the test area closed to anyone not taking part.',
  },
  {
    id: 'redesign',
    title: 'Redesigned windings and the nameplate',
    text:
      'A winding that differs from the original (turns, wire size, connection, voltage, speed or rating) must ' +
      'be reviewed and approved by a qualified person before it is used. The nameplate must then be updated, ' +
      'or a supplementary plate fitted beside it, so it states what the motor now is.',
  },
  {
    id: 'hazardous-location',
    title: 'Hazardous-location and listed motors',
    text:
      'A motor certified for explosive atmospheres, or listed by a testing body, may lose that certification ' +
      'when it is repaired or redesigned. Such repairs follow IEC 60079-19 (or the local equivalent), done by ' +
      'a shop qualified for them; if this shop is not, the motor must not go back into the hazardous area on ' +
      'the strength of this sheet.',
  },
];

/** The last words of every sheet. */
export const CLOSING_STATEMENT =
  'The calculations and verdicts on this sheet are aids to qualified people, not a guarantee. Local codes ' +
  'and regulations, the manufacturer’s data and licensed or qualified practice govern the repair, ' +
  'testing, installation and use of this motor.';

/** The cautions shown on the final-tests screen, above the form. */
export const TEST_HAZARD_CAUTIONS: readonly string[] = [
  'High voltage: IR, hipot and surge tests can kill. Only trained people test.',
  'Barricade the test area and post warning signs; nobody touches the motor or its leads during a test.',
  'After a DC test, discharge the winding to ground and keep it grounded until it is connected or stored.',
  'Hipot only after satisfactory IR and PI readings on a clean, dry winding; repeat tests at the reduced level.',
];
