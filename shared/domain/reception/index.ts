export * from './reception';
