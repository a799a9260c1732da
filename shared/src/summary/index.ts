export * from './summarize-inspection.js';
export * from './spot-fix.js';
