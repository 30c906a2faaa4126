import { describe, expect, it } from 'vitest';
import { hoseClassInfo, hoseClassProblem, hoseClassSchema } from './hose-classes.js';

describe('hose classes', () => {
  it('SAE J1532 Type A transmission oil cooler hose: 250 psi (1.7 MPa), classes to 125, 150 and 165 °C (DOMAIN.md §1)', () => {
    expect(hoseClassInfo['sae-j1532-125']).toMatchObject({ maxPressurePsi: 250, maxTempF: 257 });
    expect(hoseClassInfo['sae-j1532-150']).toMatchObject({ maxPressurePsi: 250, maxTempF: 302 });
    expect(hoseClassInfo['sae-j1532-165']).toMatchObject({ maxPressurePsi: 250, maxTempF: 329 });
    // °F = °C × 9/5 + 32
    for (const [cls, c] of [['sae-j1532-125', 125], ['sae-j1532-150', 150], ['sae-j1532-165', 165]] as const) {
      expect(hoseClassInfo[cls].maxTempF).toBe(c * 1.8 + 32);
    }
  });

  it('checks the class against the fluid and the temperature', () => {
    expect(hoseClassProblem('sae-j1532-150', 'atf', 250)).toBeUndefined();
    expect(hoseClassProblem('sae-j1532-150', 'gasoline', 100)).toMatch(/not gasoline/);
    expect(hoseClassProblem('sae-j1532-125', 'atf', 280)).toMatch(/257 °F/);
    expect(hoseClassProblem('sae-j30r7', 'e85', 100)).toMatch(/not e85/); // J30 classes are not written for ethanol blends (from memory)
    expect(hoseClassProblem('sae-100r14', 'e85', 300)).toBeUndefined(); // PTFE tube
    expect(hoseClassProblem('sae-j20', 'coolant', 220)).toBeUndefined();
    expect(hoseClassProblem('sae-100r1', 'gasoline')).toMatch(/not gasoline/); // SAE J517 is written for hydraulic fluids
  });

  it('every class names its standard and its source', () => {
    for (const cls of hoseClassSchema.options) {
      expect(hoseClassInfo[cls].standard.length).toBeGreaterThan(0);
      expect(hoseClassInfo[cls].source).toMatch(/SAE|common practice|DOMAIN/);
      expect(hoseClassInfo[cls].fluids.length).toBeGreaterThan(0);
    }
  });
});
