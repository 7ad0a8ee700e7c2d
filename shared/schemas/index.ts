export * from './fields';
export * from './auth';
export * from './unit';
export * from './station';
export * from './schedule';
export * from './club';
export * from './device';
export * from './pairing';
