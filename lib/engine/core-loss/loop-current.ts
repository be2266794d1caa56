/**
 * The current the test loop draws, from its ampere-turns: Ampère's law round the mean magnetic path,
 *
 *   N·I = H·l_m   →   I = H·l_m/N
 *
 * with H the rms magnetising field strength the steel needs at the test density. H is an assumption, not a
 * property the sheet knows: the shop setting defaults to DEFAULT_LOOP_FIELD_STRENGTH_A_PER_M. The loss
 * (in-phase) current adds a little; a damaged core draws more, so choose cable and supply with margin.
 */

/**
 * 300 A/m rms: non-oriented silicon steel near 1.3–1.5 T at 50/60 Hz needs roughly 150–400 A/m [from memory:
 * steel makers' magnetisation curves]; the upper middle is taken so that the cable and supply are not
 * undersized. Configurable (shop setting).
 */
export const DEFAULT_LOOP_FIELD_STRENGTH_A_PER_M = 300;

/** I = H·l_m/N, amperes rms. */
export const loopCurrentA = (fieldStrengthAPerM: number, meanPathM: number, turns: number): number =>
  (fieldStrengthAPerM * meanPathM) / turns;
