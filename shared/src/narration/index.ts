export * from './types.js';
export { scoreNarration } from './score-narration.js';
