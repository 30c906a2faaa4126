import { circuitDocumentSchema, type CircuitDocument, type Flag, type LineReport } from '@linesmith/routing';
import { checkResult, coolerDraft } from '../../circuits/test-support/circuit-fixtures';

export const reviewDocument: CircuitDocument = circuitDocumentSchema.parse(coolerDraft);

/** A line report in the routing lib's full shape (as the review endpoints send it). */
export function fullLineReport(lineId: string, cutLengthIn: number | null): LineReport {
  return {
    lineId,
    hosePartId: 'hose-6',
    drawnLengthIn: 20,
    measuredLengthIn: null,
    centrelineIn: 20,
    basis: 'drawn',
    endStackFromIn: 1.5,
    endStackToIn: 1,
    crossesMounts: true,
    slackIn: 1.5,
    requiredSlackIn: 1.5,
    slackRule: 'cross-mount-minimum',
    exactCutIn: cutLengthIn,
    cutLengthIn,
    toleranceIn: 0.1875,
    fits: true,
    supports: { atIn: [{ id: 's-1', atIn: 9 }], spans: [], longestSpanIn: 11, proposedAtIn: [] },
    sleeves: { requiredIn: [], plannedIn: [], plannedLengthIn: 0, placed: [], uncoveredIn: [], contact: false, zoneIds: [] },
  };
}

export const supportGapCaution: Flag = {
  code: 'support-gap',
  severity: 'caution',
  message: 'An unsupported span of 19 in is longer than the shop spacing of 18 in.',
  target: { kind: 'line', id: 'line-1' },
  fix: 'Add a clamp.',
};

export const openPortCaution: Flag = {
  code: 'open-port',
  severity: 'caution',
  message: 'The transmission cooler return port has no line and no plug.',
  target: { kind: 'port', id: 'ret', unitId: 'trans' },
  fix: 'Run a line to it or plug it.',
};

export const jointSeatBlocker: Flag = {
  code: 'joint-seat',
  severity: 'blocker',
  message: 'The threads engage but the seats differ.',
  target: { kind: 'joint', id: 'line-1:to:0', lineId: 'line-1', end: 'to', index: 0 },
  fix: 'Use an adapter to the port seat.',
};

export function evaluationWith(flags: Flag[], cutLengthIn: number | null = 23.6875) {
  const { bom } = checkResult([]);
  return { lines: [fullLineReport('line-1', cutLengthIn)], flags, bom };
}

export function reviewBody(options: { flags: Flag[]; acknowledgements?: unknown[]; decision?: unknown; status?: string; revisionNumber?: number }) {
  return {
    status: options.status ?? 'in-review',
    revisionNumber: options.revisionNumber ?? 2,
    document: coolerDraft,
    evaluation: evaluationWith(options.flags),
    acknowledgements: options.acknowledgements ?? [],
    decision: options.decision ?? null,
    submittedBy: { id: 'u-fab', displayName: 'Rafe Okonkwo' },
  };
}
