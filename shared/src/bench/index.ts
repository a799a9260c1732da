export * from './measure.js';
