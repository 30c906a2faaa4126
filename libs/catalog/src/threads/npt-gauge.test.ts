import { describe, expect, it } from 'vitest';
import { nptGauge } from '../standards/tables.js';
import { nptMaleMajorRangeIn } from './npt-gauge.js';

/**
 * ASME B1.20.1 Table 2 published E0 (pitch diameter at the small end) and L2 (effective thread
 * length), in. The 1/4 row is given in DOMAIN.md; the other rows are from memory of the table
 * (they agree with the formulas to the table's last digit).
 */
const table2: Array<{ size: string; e0: number; l2: number; source: string }> = [
  { size: '1/16', e0: 0.27118, l2: 0.2611, source: 'ASME B1.20.1 Table 2, from memory' },
  { size: '1/8', e0: 0.36351, l2: 0.2639, source: 'ASME B1.20.1 Table 2, from memory' },
  { size: '1/4', e0: 0.47739, l2: 0.4018, source: 'ASME B1.20.1 Table 2 (DOMAIN.md)' },
  { size: '3/8', e0: 0.61201, l2: 0.4078, source: 'ASME B1.20.1 Table 2, from memory' },
  { size: '1/2', e0: 0.75843, l2: 0.5337, source: 'ASME B1.20.1 Table 2, from memory' },
  { size: '3/4', e0: 0.96768, l2: 0.5457, source: 'ASME B1.20.1 Table 2, from memory' },
  { size: '1', e0: 1.21363, l2: 0.6828, source: 'ASME B1.20.1 Table 2, from memory' },
];

describe('NPT gauge dimensions, ASME B1.20.1 Table 2', () => {
  it.each(table2)('$size NPT: E0 $e0, L2 $l2 ($source)', ({ size, e0, l2 }) => {
    const gauge = nptGauge(size);
    expect(gauge).toBeDefined();
    expect(gauge!.e0).toBeCloseTo(e0, 4);
    expect(gauge!.l2).toBeCloseTo(l2, 3);
  });

  it('has no gauge for a size not in the table', () => {
    expect(nptGauge('5/16')).toBeUndefined();
  });

  it('a male 1/4 NPT reads below its 0.540 in pipe OD at the small end (taper 1 in 16, ASME B1.20.1)', () => {
    const range = nptMaleMajorRangeIn(0.54, 18);
    // Small-end major = E0 + thread height 0.8/n = 0.47739 + 0.04444 (ASME B1.20.1 Table 2 and h = 0.8p).
    expect(range.minIn).toBeCloseTo(0.52183, 4);
    // Along L2 the diameter grows by L2/16 = 0.02511 in.
    expect(range.maxIn - range.minIn).toBeCloseTo(0.4018 / 16, 4);
    expect(range.minIn).toBeLessThan(0.54);
  });
});
