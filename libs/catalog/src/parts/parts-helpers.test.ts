import { describe, expect, it } from 'vitest';
import { demoParts } from '../demo/demo-catalogue.js';
import { fitsOd } from './fits-od.js';
import { hoseEndFitsHose } from './hose-end-fits-hose.js';
import { partConnections } from './part-connections.js';
import type { Part, PartOf } from './part.schema.js';

function byId<K extends Part['kind']>(id: string, kind: K): PartOf<K> {
  const part = demoParts.find((p) => p.id === id);
  if (!part || part.kind !== kind) throw new Error(`no ${kind} ${id}`);
  return part as PartOf<K>;
}

describe('parts helpers', () => {
  it('a hose end fits only its dash and hose type', () => {
    const rubber6 = byId('demo-hose-6-rubber', 'hose');
    const ptfe6 = byId('demo-hose-6-ptfe', 'hose');
    const rubber8 = byId('demo-hose-8-rubber', 'hose');
    const end = byId('demo-hose-end-6-rubber-90', 'hose-end');
    expect(hoseEndFitsHose(end, rubber6)).toBe(true);
    expect(hoseEndFitsHose(end, ptfe6)).toBe(false);
    expect(hoseEndFitsHose(end, rubber8)).toBe(false);
  });

  it('a hose end fits only the kinds of hose end its hose is made for (a barbed end on the cooler hose, not on braided hose)', () => {
    const cooler = byId('demo-hose-6-cooler', 'hose');
    const barbed = byId('demo-hose-end-6-cooler-0', 'hose-end');
    expect(hoseEndFitsHose(barbed, cooler)).toBe(true);
    const reusable = { ...barbed, attributes: { ...barbed.attributes, endType: 'reusable' as const } };
    expect(hoseEndFitsHose(reusable, cooler)).toBe(false);
    const untyped = { ...barbed, attributes: { ...barbed.attributes, endType: undefined } };
    expect(hoseEndFitsHose(untyped, cooler)).toBe(true);
    expect(hoseEndFitsHose(barbed, byId('demo-hose-6-rubber', 'hose'))).toBe(false);
  });

  it('a clamp fits hose ODs inside its range, ends included', () => {
    const clamp = byId('demo-clamp-11-16', 'clamp');
    expect(fitsOd(clamp, 0.63)).toBe(true);
    expect(fitsOd(clamp, 0.72)).toBe(true);
    expect(fitsOd(clamp, 0.73)).toBe(false);
    expect(fitsOd(byId('demo-sleeve-1', 'sleeve'), 0.83)).toBe(true);
  });

  it('lists the ends each kind presents', () => {
    expect(partConnections(byId('demo-adapter-orb6-f37-6', 'adapter'))).toEqual([
      { family: 'orb', size: '-6', gender: 'male' },
      { family: 'flare37', size: '-6', gender: 'male' },
    ]);
    expect(partConnections(byId('demo-hose-end-8-ptfe-0', 'hose-end'))).toEqual([{ family: 'flare37', size: '-8', gender: 'female' }]);
    expect(partConnections(byId('demo-plug-npt4', 'plug'))).toEqual([{ family: 'npt', size: '1/4', gender: 'male' }]);
    expect(partConnections(byId('demo-hose-6-rubber', 'hose'))).toEqual([]);
  });
});
