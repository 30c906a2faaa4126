export * from './circuit/document.schema.js';
export * from './circuit/migrate.js';
export * from './circuit/circuit-kinds.js';
export * from './geometry/vec.js';
export * from './geometry/units.js';
export * from './geometry/segment.js';
export * from './geometry/polygon.js';
export * from './geometry/intervals.js';
export * from './geometry/centreline.js';
export * from './geometry/route-path.js';
export * from './units/length-format.js';
export * from './rules/shop-rules.js';
export * from './rules/flag.js';
export type { Rule, RuleContext } from './rules/rule.js';
export { ruleRegistry } from './rules/registry.js';
export * from './lines/cut-length.js';
export { bendRadiusCheck, hoseFit, type BendRadiusBasis, type BendRadiusCheck, type HoseFit, type RigidEnd } from './lines/hose-fit.js';
export { THRESHOLD_TOLERANCE, isAbove, isBelow } from './rules/compare.js';
export { ROLE_DIRECTION, portDirection, type FlowDirection } from './rules/flow-direction.rule.js';
export * from './lines/supports.js';
export * from './lines/heat.js';
export type { LineReport, PlacedSleeve, SleeveProblem } from './lines/line-report.js';
export type { LineAnalysis, HoseStatus } from './lines/analyse-line.js';
export type { ResolvedStack, StackItem, StackJoint } from './lines/end-stack.js';
export type { PortEntry } from './lines/port-entry.js';
export { portPosition } from './lines/port-position.js';
export type { BomRow, BillOfMaterials } from './bom/bom-row.js';
export { billOfMaterials } from './bom/bill-of-materials.js';
export { priceOf } from './bom/price.js';
export {
  buildOrderSheets,
  saleUnitLabel,
  taxOf,
  type OrderSheet,
  type OrderSheetLine,
  type OrderSheets,
  type UnorderableRow,
} from './bom/order-sheet.js';
export * from './evaluate/evaluate-circuit.js';
export { createEvaluator, type CircuitEvaluator } from './evaluate/create-evaluator.js';
export * from './evaluate/work-budget.js';
export { flagKey } from './rules/flag-key.js';
export * from './compare/compare-documents.js';
