// @yardcall/shared/testing: sample vehicles and hand-built checklists for tests, kept out of the main
// entry so no screen or route of the apps bundles them.
export {
  handItem,
  sampleCombination,
  sampleTractor,
  sampleTrailer,
  stopPerItem,
  threeZoneChecklist,
} from './checklist/fixtures.js';
