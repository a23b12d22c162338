export * from './enums.ts';
export * from './labs.ts';
export * from './materials.ts';
export * from './models.ts';
export * from './readings.ts';
export * from './analysis.ts';
export * from './annealing.ts';
