/**
 * An amplifier's DC supply: input power P = V·I (or output / efficiency), the heat it must shed
 * (DC in + RF drive − RF out: energy is conserved), and cautions for heatsinking and fusing.
 */
import { refuse, type Result } from '../result';

/** Miniature fuse ratings in the IEC 60127 series, amperes (R10 preferred numbers; from memory). */
export const FUSE_RATINGS_A = [
  0.1, 0.125, 0.16, 0.2, 0.25, 0.315, 0.4, 0.5, 0.63, 0.8, 1, 1.25, 1.6, 2, 2.5, 3.15, 4, 5, 6.3, 8, 10, 12.5, 16, 20,
];

/** Heat a small TO-92/SOT-223/TO-220 part sheds in free air before it needs a heatsink (common practice, no source). */
export const FREE_AIR_HEAT_W = 1;
/** Fuse at about 1.5 × the normal draw so it survives switch-on but opens on a fault (common practice, no source). */
export const FUSE_FACTOR = 1.5;

export type SupplyFigures = {
  dcInputW: number;
  currentA: number;
  supplyV: number | null;
  rfOutputW: number;
  rfDriveW: number;
  heatW: number;
  efficiency: number;
  needsHeatsink: boolean;
  fuseA: number;
  cautions: string[];
};

export function amplifierSupply(input: {
  rfOutputW: number;
  rfDriveW?: number;
  supplyV?: number;
  supplyA?: number;
  efficiency?: number;
}): Result<SupplyFigures> {
  const rfOutputW = input.rfOutputW;
  const rfDriveW = input.rfDriveW ?? 0;
  if (!(rfOutputW >= 0)) return refuse('The RF output must be 0 W or more.');
  let dcInputW: number;
  let currentA: number;
  const supplyV = input.supplyV ?? null;
  if (input.supplyV !== undefined && input.supplyA !== undefined && input.supplyV > 0 && input.supplyA > 0) {
    dcInputW = input.supplyV * input.supplyA;
    currentA = input.supplyA;
  } else if (input.efficiency !== undefined) {
    if (!(input.efficiency > 0 && input.efficiency <= 1)) return refuse('The efficiency must be more than 0 and at most 1 (100 %).');
    dcInputW = rfOutputW / input.efficiency;
    if (!(supplyV && supplyV > 0)) return refuse('Give the supply voltage too, so the current and the fuse can be worked out.');
    currentA = dcInputW / supplyV;
  } else {
    return refuse('Give the supply voltage and current, or the supply voltage and the efficiency.');
  }
  const heatW = dcInputW + rfDriveW - rfOutputW;
  if (heatW < -1e-9) {
    return refuse(
      `${dcInputW.toFixed(2)} W of DC cannot give ${rfOutputW.toFixed(2)} W of RF: check the supply current or the output power.`,
    );
  }
  const efficiency = dcInputW > 0 ? rfOutputW / dcInputW : 0;
  const needsHeatsink = heatW > FREE_AIR_HEAT_W;
  const fuseA = FUSE_RATINGS_A.find((a) => a >= currentA * FUSE_FACTOR) ?? FUSE_RATINGS_A[FUSE_RATINGS_A.length - 1];
  const cautions = [
    `Fuse the supply lead close to the source: about ${fuseA} A for a ${currentA.toFixed(2)} A draw, and use wire rated for it.`,
  ];
  if (needsHeatsink)
    cautions.unshift(
      `The amplifier turns ${heatW.toFixed(1)} W into heat: mount its transistor on a heatsink and check its temperature after a long transmission.`,
    );
  return {
    ok: true,
    dcInputW,
    currentA,
    supplyV,
    rfOutputW,
    rfDriveW,
    heatW: Math.max(0, heatW),
    efficiency,
    needsHeatsink,
    fuseA,
    cautions,
  };
}
