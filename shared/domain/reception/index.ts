export * from './reception';
export * from './csv';
