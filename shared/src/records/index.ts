export * from './retention.js';
