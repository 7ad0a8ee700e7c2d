export * from './reception';
export * from './csv';
export * from './import-mapping';
export * from './statistics';
export * from './calibration-from-reports';
export * from './stability';
