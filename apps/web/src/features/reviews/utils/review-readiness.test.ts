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

  it('ignores an acknowledgement of a different item with the same code', () => {
    const state = reviewReadiness([supportGapCaution], [{ flagKey: 'support-gap@line:line-2', note: 'other line', by, at }]);
    expect(state.canApprove).toBe(false);
  });
});
