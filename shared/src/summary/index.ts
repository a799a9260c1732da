export * from './summarize-inspection.js';
