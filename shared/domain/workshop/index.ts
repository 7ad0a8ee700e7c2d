export * from './coverage';
export * from './filter-selection';
export * from './spurious';
export * from './on-air';
export * from './station-config';
export * from './device-config';
export * from './compliance';
