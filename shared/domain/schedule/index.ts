/** Band rotation schedules: the model, the expansion into transmissions, editor checks, presets and the fleet stagger. */
export * from './model';
export * from './dates';
export * from './prng';
export * from './offsets';
export * from './steps';
export * from './expand';
export * from './preview';
export * from './validate';
export * from './presets';
export * from './stagger';
export * from './stagger-pairwise';
