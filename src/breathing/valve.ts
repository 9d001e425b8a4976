/** Valve and seat numbers in one import: areas and flow stages, the greatest restriction, and workshop notes. */

export * from './valve-areas.ts';
export * from './restriction.ts';
export * from './valve-practice.ts';
