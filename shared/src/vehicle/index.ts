export * from './vehicle.js';
export * from './validate-vehicle.js';
