/**
 * Several test runs can share one machine (and one checkout) when each takes its
 * own slot: BARWRIGHT_TEST_SLOT=0..9 shifts every port and data folder the
 * tests use. The default, 0, is what CI and `npm test` use.
 */
export const slot = (() => {
  const n = Number(process.env.BARWRIGHT_TEST_SLOT ?? 0);
  return Number.isInteger(n) && n >= 0 && n <= 9 ? n : 0;
})();

/** A port for this slot: slots are 100 ports apart. */
export const slotPort = (base: number) => base + 100 * slot;

/** A data folder for this slot. */
export const slotDir = (base: string) => (slot === 0 ? base : `${base}-slot${slot}`);
