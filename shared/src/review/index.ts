export * from './case-status.js';
export * from './decision-kinds.js';
export * from './decisions-in-force.js';
