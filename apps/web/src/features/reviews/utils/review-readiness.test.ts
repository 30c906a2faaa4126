import { describe, expect, it } from 'vitest';
import { jointSeatBlocker, openPortCaution, supportGapCaution } from '../test-support/review-fixtures';
import { reviewReadiness } from './review-readiness';

const by = { id: 'u-lead', displayName: 'Hollis Brandt' };
const at = '2026-01-07T10:00:00.000Z';

describe('reviewReadiness (DOMAIN §5: blockers must be fixed, cautions acknowledged)', () => {
  it('cannot approve while any caution is unacknowledged', () => {
    const state = reviewReadiness([supportGapCaution, openPortCaution], [{ flagKey: 'support-gap@line:line-1', note: 'ok then', by, at }]);
    expect(state.openCautions).toBe(1);
    expect(state.canApprove).toBe(false);
  });

  it('can approve once every caution is acknowledged and no blocker remains', () => {
    const state = reviewReadiness(
      [supportGapCaution, openPortCaution],
      [
        { flagKey: 'support-gap@line:line-1', note: 'clamped', by, at },
        { flagKey: 'open-port@port:trans/ret', note: 'plugged on the bench', by, at },
      ],
    );
    expect(state.canApprove).toBe(true);
  });

  it('cannot approve with a blocker, whatever was acknowledged', () => {
    const state = reviewReadiness([jointSeatBlocker], []);
    expect(state.blockers).toHaveLength(1);
    expect(state.canApprove).toBe(false);
  });

  it('keeps every flag one acknowledgement covers: two narrow fittings on one line share a key and both stay listed', () => {
    const narrow = (message: string) => ({
      code: 'restriction',
      severity: 'caution' as const,
      message,
      target: { kind: 'line' as const, id: 'line-1', lineId: 'line-1' },
      fix: 'Choose a full-flow fitting.',
    });
    const state = reviewReadiness([narrow('Hose end bore 0.285 in'), narrow('Adapter bore 0.3 in')], []);
    expect(state.cautions).toHaveLength(1);
    expect(state.openCautions).toBe(1);
    expect([state.cautions[0].flag, ...state.cautions[0].alsoFlags].map((f) => f.message)).toEqual([
      'Hose end bore 0.285 in',
      'Adapter bore 0.3 in',
    ]);
  });

  it('ignores an acknowledgement of a different item with the same code', () => {
    const state = reviewReadiness([supportGapCaution], [{ flagKey: 'support-gap@line:line-2', note: 'other line', by, at }]);
    expect(state.canApprove).toBe(false);
  });
});
