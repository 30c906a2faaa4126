import { describe, expect, it } from 'vitest';
import { evaluateCircuit } from '../evaluate/evaluate-circuit.js';
import { defaultShopRules } from '../rules/shop-rules.js';
import { coolerCircuit, testParts } from '../test-support/fixtures.js';
import { priceOf } from './price.js';

describe('bill of materials', () => {
  it('lists plugs with the seal their port needs, and seals the catalogue lacks without a part', () => {
    const doc = coolerCircuit((d) => {
      d.units[0].ports.push(
        { id: 'spare', connection: { family: 'orb', size: '-6', gender: 'female' }, role: 'vent', dx: 0, dy: 50, plugPartId: 'plug-orb6' },
        { id: 'test', connection: { family: 'metric', size: 'M14x1.5', gender: 'female' }, role: 'vent', dx: 0, dy: 80, plugPartId: 'plug-orb6' },
      );
    });
    const { bom } = evaluateCircuit(doc, testParts, defaultShopRules);
    expect(bom.rows.find((r) => r.partId === 'plug-orb6')).toMatchObject({ quantity: 2, unit: 'each', priceCents: 600 });
    // Two connected O-ring boss ports and the plugged one: three AS568-906 (SAE J1926-1: -9NN for dash -NN, from memory).
    expect(bom.rows.find((r) => r.partId === 'oring-906')?.quantity).toBe(3);
    const metric = bom.rows.find((r) => r.kind === 'seal' && r.partId === null);
    expect(metric?.description).toMatch(/M14x1\.5.*not in the catalogue/);
    expect(metric?.priceCents).toBeNull();
    expect(bom.unpricedRows).toBe(1);
  });

  it('prices sleeve by the foot from its planned length and applies the shop’s tax rate', () => {
    const doc = coolerCircuit((d) => (d.lines[0].sleeves = [{ id: 'v', startIn: 6, endIn: 24, partId: 'sleeve-3-4' }]));
    const { bom } = evaluateCircuit(doc, testParts, defaultShopRules, { taxRatePercent: 8.25 });
    expect(bom.rows.find((r) => r.partId === 'sleeve-3-4')).toMatchObject({ quantity: 18, unit: 'in', priceCents: 2250 });
    expect(bom.taxCents).toBe(Math.round(bom.subtotalCents * 0.0825));
    expect(bom.totalCents).toBe(bom.subtotalCents + bom.taxCents);
  });

  it('prices by sale unit: per foot for inches, per each or pack share for counts, nothing when they do not fit', () => {
    expect(priceOf(900, { type: 'foot' }, 30, 'in')).toBe(2250);
    expect(priceOf(1200, { type: 'each' }, 3, 'each')).toBe(3600);
    expect(priceOf(600, { type: 'pack', size: 10 }, 3, 'each')).toBe(180);
    expect(priceOf(600, { type: 'each' }, 30, 'in')).toBeNull();
    expect(priceOf(900, { type: 'foot' }, 2, 'each')).toBeNull();
  });
});
