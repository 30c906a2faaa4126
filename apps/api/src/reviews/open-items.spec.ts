import { flagKey, type Flag, type Severity } from '@linesmith/routing';
import { countFlags, isClear, openItemsOf } from './open-items.js';

const flag = (code: string, severity: Severity, lineId = 'L1'): Flag => ({
  code,
  severity,
  message: `${code} on ${lineId}`,
  target: { kind: 'line', id: lineId, lineId },
  fix: '',
});

describe('open items of a review', () => {
  const flags = [flag('incomplete-line', 'blocker'), flag('support-gap', 'caution'), flag('restriction', 'caution', 'L2'), flag('x-note', 'note')];

  it('keeps every blocker open, closes a caution only with its acknowledgement, and ignores notes', () => {
    const none = openItemsOf(flags, new Set());
    expect(none.blockers.map((f) => f.key)).toEqual(['incomplete-line@line:L1']);
    expect(none.unacknowledgedCautions.map((f) => f.key)).toEqual(['support-gap@line:L1', 'restriction@line:L2']);
    expect(isClear(none)).toBe(false);

    // Acknowledging a blocker's key changes nothing: blockers are fixed, not accepted.
    const all = new Set(flags.map(flagKey));
    const acknowledged = openItemsOf(flags, all);
    expect(acknowledged.unacknowledgedCautions).toEqual([]);
    expect(acknowledged.blockers).toHaveLength(1);
    expect(isClear(acknowledged)).toBe(false);
  });

  it('is clear with no blocker and every caution acknowledged', () => {
    const cautionsOnly = flags.filter((f) => f.severity !== 'blocker');
    expect(isClear(openItemsOf(cautionsOnly, new Set(['support-gap@line:L1'])))).toBe(false);
    expect(isClear(openItemsOf(cautionsOnly, new Set(['support-gap@line:L1', 'restriction@line:L2'])))).toBe(true);
    expect(isClear(openItemsOf([flag('x-note', 'note')], new Set()))).toBe(true);
  });

  it('counts blockers and cautions for the queue', () => {
    expect(countFlags(flags)).toEqual({ blockers: 1, cautions: 2 });
  });
});
