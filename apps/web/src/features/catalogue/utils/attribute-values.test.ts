import { demoParts, partAttributeSchemas } from '@linesmith/catalog';
import { describe, expect, it } from 'vitest';
import { attributeValuesOf, checkAttributes, emptyAttributeValues } from './attribute-values';

describe('part editor attribute values', () => {
  // The catalogue library's demo parts are valid by its own schemas: the editor must be able to
  // show every one of them and give the same attributes back, or it would lose data on save.
  it.each(demoParts.map((part) => [part.id, part] as const))('round-trips %s unchanged', (_, part) => {
    const checked = checkAttributes(part.kind, attributeValuesOf(part.kind, part.attributes));
    expect(checked).toEqual({ ok: true, attributes: partAttributeSchemas[part.kind].parse(part.attributes) });
  });

  it('names the blank fields of an empty adapter, connection by connection', () => {
    const checked = checkAttributes('adapter', emptyAttributeValues('adapter'));
    expect(checked.ok).toBe(false);
    if (checked.ok) return;
    expect(checked.errors['a.family']).toBe('Choose the family of connection a.');
    expect(checked.errors['b.size']).toBe('Choose the size of connection b.');
    expect(checked.errors.bodyLengthIn).toBe('Enter the body length.');
    // Optional in DOMAIN.md §2: no seal and no pressure rating are fine.
    expect(checked.errors['seal.type']).toBeUndefined();
    expect(checked.errors.maxPressurePsi).toBeUndefined();
  });

  it('offers the optional rated pressure on a plug, as on an adapter', () => {
    const connection = { 'connection.family': 'orb', 'connection.size': '-6', 'connection.gender': 'male' };
    const unrated = checkAttributes('plug', { ...emptyAttributeValues('plug'), ...connection });
    expect(unrated).toEqual({ ok: true, attributes: { connection: { family: 'orb', size: '-6', gender: 'male' } } });
    const rated = checkAttributes('plug', { ...emptyAttributeValues('plug'), ...connection, maxPressurePsi: '3000' });
    expect(rated.ok && (rated.attributes as { maxPressurePsi?: number }).maxPressurePsi).toBe(3000);
    const zero = checkAttributes('plug', { ...emptyAttributeValues('plug'), ...connection, maxPressurePsi: '0' });
    expect(zero.ok).toBe(false);
    if (!zero.ok) expect(Object.keys(zero.errors)).toEqual(['maxPressurePsi']);
  });

  it('passes on the schema message when a value is present but wrong', () => {
    const values = { ...emptyAttributeValues('clamp'), 'fitsOd.minIn': '0.9', 'fitsOd.maxIn': '0.5' };
    const checked = checkAttributes('clamp', values);
    expect(checked).toEqual({ ok: false, errors: { 'fitsOd.minIn': 'minIn must not exceed maxIn' } });
  });
});
