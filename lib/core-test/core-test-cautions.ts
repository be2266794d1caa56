/**
 * Cautions for the core-loss (loop) test, in our own words, shown at the head of the core-test page.
 */
export const CORE_TEST_CAUTIONS: readonly string[] = [
  'The loop carries a high current and the core is a transformer core: size the cable for the expected current with margin, keep connections tight, and never open or re-arrange the loop while it is energised.',
  'The voltage induced in any other turn round the core (including a search coil, tools or a wire left in a slot) follows the loop’s volts per turn: keep everything else clear of the core.',
  'Supply the loop through a switched, fused and isolated supply that can be locked off; barricade the test area and let only trained people in while it is energised.',
  'The core and the loop heat up, and hot spots can be far hotter than the rest: limit the test time, watch the temperature, and wear gloves when touching the core.',
  'Stop at once on smoke, arcing or a hot spot that keeps climbing. Follow local electrical codes and licensed practice for test supplies and isolation.',
];
