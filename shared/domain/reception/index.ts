export * from './reception';
export * from './csv';
export * from './import-mapping';
export * from './signed-rank';
export * from './comparison';
