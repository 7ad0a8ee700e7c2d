/** Bench computations for a beacon's build: attenuator pads, the amplifier's supply, RF exposure, filter selection. */
export * from './attenuator';
export * from './supply';
export * from './exposure';
