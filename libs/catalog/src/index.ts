export * from './connections.js';
export * from './parts/part.schema.js';
export * from './parts/hose-end-fits-hose.js';
export * from './parts/fits-od.js';
export * from './parts/part-connections.js';
export {
  hoseClassSchema,
  hoseClassInfo,
  hoseClassProblem,
  hoseEndTypeSchema,
  hoseEndTypeLabels,
  type HoseClass,
  type HoseClassInfo,
  type HoseEndType,
} from './parts/hose-classes.js';
export {
  sealCompoundSchema,
  sealCompoundLabels,
  compoundRating,
  compoundProblem,
  compoundMaxTempF,
  suitableCompounds,
  COMPOUND_SOURCE,
  type SealCompound,
  type CompoundRating,
} from './seals/seal-compounds.js';
export type { ThreadRow } from './standards/thread-row.js';
export { dashToTubeOd, parseDash, MM_PER_IN } from './standards/dash.js';
export {
  families,
  familyLabel,
  listSizes,
  isValidSize,
  threadOf,
  nptGauge,
  canonicalSize,
  isValidConnection,
  connectionProblem,
  whitworthPitchDiameterIn,
  type ThreadInfo,
} from './standards/tables.js';
export {
  seatFormsOf,
  seatFormInfo,
  seatOf,
  defaultSeat,
  hasSeatForms,
  sizeHasSeat,
  cone24TubeOd,
  type SeatFormInfo,
} from './standards/seat-forms.js';
export { threadTable, sealNeedWords, type ReferenceRow } from './standards/reference.js';
export { sealForPort, sealsForPort } from './standards/seal.js';
export { parseMetricDesignation } from './standards/metric.table.js';
export {
  parseUnifiedDesignation,
  parseFractionIn,
  basicPitchDiameterIn,
  type UnifiedThread,
  type UnifiedSeries,
} from './threads/unified-thread.js';
export { nptGaugeFor, nptMaleMajorRangeIn, NPT_TAPER_ON_DIAMETER, type NptGauge } from './threads/npt-gauge.js';
export { mate } from './mating/mate.js';
export type { MateCode, MateResult } from './mating/mate-result.js';
export {
  identifyThread,
  threadReadingSchema,
  FLANK_QUESTION,
  type ThreadReading,
  type ThreadCandidate,
} from './identify/identify-thread.js';
export {
  solveAdapters,
  solveOptionsSchema,
  compareChains,
  type AdapterChain,
  type SolveOptions,
} from './solver/solve-adapters.js';
export type { ChainPart, Orientation } from './solver/adapter-index.js';
export { portRequirementSchema, meetsRequirement, type PortRequirement } from './solver/port-requirement.js';
export { connectionKey, matingKeys } from './solver/connection-key.js';
export { demoSuppliers, demoParts, type DemoSupplier } from './demo/demo-catalogue.js';
export { changeConnection } from './connection-edit.js';
