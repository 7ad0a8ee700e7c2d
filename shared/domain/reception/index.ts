export * from './reception';
export * from './csv';
export * from './import-mapping';
