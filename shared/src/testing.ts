// @yardcall/shared/testing: sample vehicles and helpers for the apps' tests, kept out of the main entry
// so no screen or route of the apps bundles them.
export { sampleCombination, sampleTractor, sampleTrailer, stopPerItem } from './checklist/fixtures.js';
