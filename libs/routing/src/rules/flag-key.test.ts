import { describe, expect, it } from 'vitest';
import { evaluateCircuit } from '../evaluate/evaluate-circuit.js';
import { coolerCircuit, testParts } from '../test-support/fixtures.js';
import type { Flag } from './flag.js';
import { flagKey } from './flag-key.js';
import { defaultShopRules } from './shop-rules.js';

const flag = (code: string, target: Flag['target'], message = 'm'): Flag => ({ code, severity: 'caution', message, target, fix: '' });

describe('flagKey', () => {
  it('keys a flag by code and target, whatever its message says', () => {
    const target = { kind: 'line' as const, id: 'L1', lineId: 'L1' };
    expect(flagKey(flag('support-gap', target, 'longest 20 in'))).toBe('support-gap@line:L1');
    expect(flagKey(flag('support-gap', target, 'longest 26 in'))).toBe(flagKey(flag('support-gap', target)));
    expect(flagKey(flag('heat-sleeve', target))).not.toBe(flagKey(flag('support-gap', target)));
  });

  it('tells apart ports of the same id on two units, corners of one line, and joints', () => {
    expect(flagKey(flag('open-port', { kind: 'port', id: 'out', unitId: 'trans' }))).toBe('open-port@port:trans/out');
    expect(flagKey(flag('open-port', { kind: 'port', id: 'out', unitId: 'cooler' }))).toBe('open-port@port:cooler/out');
    expect(flagKey(flag('bend-radius', { kind: 'line', id: 'L1', lineId: 'L1', index: 2 }))).toBe('bend-radius@line:L1#2');
    expect(flagKey(flag('joint-seat', { kind: 'joint', id: 'L1:from:0', lineId: 'L1', end: 'from', index: 0 }))).toBe(
      'joint-seat@joint:L1:from:0',
    );
    expect(flagKey(flag('joint-thread', { kind: 'joint', id: 'trans/out:plug', unitId: 'trans' }))).toBe(
      'joint-thread@joint:trans/out:plug',
    );
  });

  it('gives the same keys when the same document is evaluated again, one per finding of a real evaluation', () => {
    const doc = coolerCircuit((input) => {
      input.lines = [input.lines[0]!];
      input.lines[0]!.supports = [];
    });
    const keys = evaluateCircuit(doc, testParts, defaultShopRules).flags.map(flagKey);
    expect(keys).toEqual(evaluateCircuit(doc, testParts, defaultShopRules).flags.map(flagKey));
    expect(keys).toContain('open-port@port:trans/ret');
    expect(keys).toContain('open-port@port:cooler/out');
    expect(new Set(keys).size).toBe(keys.length);
  });
});
