/**
 * WSPR power field: 0 … 60 dBm with a last digit of 0, 3 or 7
 * (WSPR protocol description, K1JT; message format section).
 */
export const WSPR_POWER_LEVELS_DBM: readonly number[] = Array.from({ length: 61 }, (_, dbm) => dbm).filter(
  (dbm) => dbm % 10 === 0 || dbm % 10 === 3 || dbm % 10 === 7,
);

export const MIN_WSPR_POWER_DBM = 0;
export const MAX_WSPR_POWER_DBM = 60;

export type PowerRounding = {
  requestedDbm: number;
  reportedDbm: number;
  /** true when the requested value was not itself an allowed level */
  rounded: boolean;
  differenceDb: number;
};

export function isWsprPowerLevel(powerDbm: number): boolean {
  return Number.isInteger(powerDbm) && powerDbm >= 0 && powerDbm <= 60 && [0, 3, 7].includes(powerDbm % 10);
}

/**
 * Nearest allowed level. A value exactly between two levels (5, 15, …) goes up,
 * as the protocol's reference encoder does (it maps a last digit 5 to 7).
 */
export function nearestWsprLevel(powerDbm: number): PowerRounding {
  let best = WSPR_POWER_LEVELS_DBM[0];
  for (const level of WSPR_POWER_LEVELS_DBM) {
    const d = Math.abs(level - powerDbm);
    const bestD = Math.abs(best - powerDbm);
    if (d < bestD - 1e-12 || (Math.abs(d - bestD) <= 1e-12 && level > best)) best = level;
  }
  return {
    requestedDbm: powerDbm,
    reportedDbm: best,
    rounded: best !== powerDbm,
    differenceDb: best - powerDbm,
  };
}
