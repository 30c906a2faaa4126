import { describe, expect, it } from 'vitest';
import { compoundProblem, compoundRating, sealCompoundSchema, suitableCompounds } from './seal-compounds.js';

// Checks against the fluid-compatibility ratings of elastomers as seal makers' compatibility
// charts give them: common practice, from memory until checked against a published chart.
describe('seal compound compatibility (common practice, from memory)', () => {
  it.each([
    ['nitrile', 'e85', 'no'],
    ['nitrile', 'gasoline', 'ok'],
    ['nitrile', 'atf', 'ok'],
    ['nitrile', 'engine-oil', 'ok'],
    ['fluorocarbon', 'e85', 'ok'],
    ['fluorocarbon', 'gasoline', 'ok'],
    ['ptfe', 'e85', 'ok'],
    ['epdm', 'engine-oil', 'no'],
    ['epdm', 'gasoline', 'no'],
    ['epdm', 'coolant', 'ok'],
    ['neoprene', 'gasoline', 'no'],
    ['hnbr', 'e85', 'limited'],
  ] as const)('%s with %s: %s', (compound, fluid, rating) => {
    expect(compoundRating(compound, fluid)).toBe(rating);
  });

  it('rates every compound for every fluid', () => {
    for (const compound of sealCompoundSchema.options) {
      for (const fluid of ['atf', 'engine-oil', 'gasoline', 'e85', 'diesel', 'power-steering', 'coolant', 'air'] as const) {
        expect(['ok', 'limited', 'no']).toContain(compoundRating(compound, fluid));
      }
    }
  });

  it('suggests fluorocarbon first for E85 and EPDM first for coolant; nitrile never for E85', () => {
    expect(suitableCompounds('e85')[0]).toBe('fluorocarbon');
    expect(suitableCompounds('e85')).not.toContain('nitrile');
    expect(suitableCompounds('coolant')[0]).toBe('epdm');
  });

  it('drops compounds the circuit temperature exceeds (nitrile about 250 °F, fluorocarbon about 400 °F; common practice)', () => {
    expect(compoundProblem('nitrile', 'atf', 275)).toMatch(/250 °F/);
    expect(compoundProblem('nitrile', 'atf', 250)).toBeUndefined();
    expect(suitableCompounds('atf', 275)).not.toContain('nitrile');
    expect(suitableCompounds('atf', 275)).toContain('fluorocarbon');
    expect(compoundProblem('copper', 'atf', 600)).toBeUndefined();
  });

  it('words the problem with the compound and fluid', () => {
    expect(compoundProblem('nitrile', 'e85')).toBe('nitrile is not compatible with e85');
    expect(compoundProblem('hnbr', 'e85')).toMatch(/limited/);
  });
});
