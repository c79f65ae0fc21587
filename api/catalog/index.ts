export * from './catalog-load.ts';
export * from './csv.ts';
export * from './fdsn-text.ts';
export * from './quakeml.ts';
export * from './parse-catalog.ts';
export * from './iso-time.ts';
