/** Breathing numbers and bench arithmetic, pure and DOM-free: shared by the app, the headless command and the tests. */

export * from './errors.ts';
export * from './units.ts';
export * from './air.ts';
export * from './bench.ts';
export * from './engine.ts';
export * from './valve.ts';
