export * from './fields';
export * from './auth';
export * from './station';
