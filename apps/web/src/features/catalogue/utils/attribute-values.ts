import { hasSeatForms, partAttributeSchemas, type Family, type PartKind } from '@linesmith/catalog';
import { attributeFields, type AttributeField } from './part-attribute-fields';

/** The editor's raw attribute values: text as typed, string lists for multi-choices. */
export type AttributeValues = Record<string, string | string[]>;

function get(source: unknown, path: string): unknown {
  let current = source;
  for (const part of path.split('.')) {
    if (current === null || typeof current !== 'object') return undefined;
    current = (current as Record<string, unknown>)[part];
  }
  return current;
}

function set(target: Record<string, unknown>, path: string, value: unknown): void {
  const parts = path.split('.');
  let current = target;
  for (const part of parts.slice(0, -1)) {
    current[part] ??= {};
    current = current[part] as Record<string, unknown>;
  }
  current[parts[parts.length - 1]] = value;
}

/** A connection's inputs; the seat form only matters for metric and BSP parallel ends. */
const connectionSubs = ['family', 'size', 'gender', 'seat'] as const;

function text(value: unknown): string {
  return value === undefined || value === null ? '' : String(value);
}

/** The editor keys of one field (a connection has three inputs, a seal two). */
export function fieldKeys(field: AttributeField): string[] {
  if (field.type === 'connection') return connectionSubs.map((sub) => `${field.key}.${sub}`);
  if (field.type === 'seal') return [`${field.key}.type`, `${field.key}.value`];
  return [field.key];
}

export function emptyAttributeValues(kind: PartKind): AttributeValues {
  const values: AttributeValues = {};
  for (const field of attributeFields[kind]) {
    for (const key of fieldKeys(field)) values[key] = field.type === 'multi-choice' ? [] : '';
  }
  return values;
}

/** Editor values of a stored part's attributes. */
export function attributeValuesOf(kind: PartKind, attributes: unknown): AttributeValues {
  const values = emptyAttributeValues(kind);
  for (const field of attributeFields[kind]) {
    const value = get(attributes, field.key);
    if (field.type === 'multi-choice') values[field.key] = Array.isArray(value) ? value.map(String) : [];
    else if (field.type === 'text-list') values[field.key] = Array.isArray(value) ? value.join(', ') : '';
    else if (field.type === 'connection') {
      for (const sub of connectionSubs) values[`${field.key}.${sub}`] = text(get(value, sub));
    } else if (field.type === 'seal') {
      const type = text(get(value, 'type'));
      values[`${field.key}.type`] = type;
      values[`${field.key}.value`] = text(get(value, type === 'o-ring' ? 'as568' : 'size'));
    } else values[field.key] = text(value);
  }
  return values;
}

function scalar(values: AttributeValues, key: string): string {
  const value = values[key];
  return typeof value === 'string' ? value.trim() : '';
}

/** Builds the attributes object from the editor's values; blank inputs are left out for the schema to name. */
export function attributesFromValues(kind: PartKind, values: AttributeValues): Record<string, unknown> {
  const attributes: Record<string, unknown> = {};
  for (const field of attributeFields[kind]) {
    switch (field.type) {
      case 'number':
      case 'angle': {
        const raw = scalar(values, field.key);
        if (raw !== '') set(attributes, field.key, Number(raw));
        break;
      }
      case 'text':
      case 'choice': {
        const raw = scalar(values, field.key);
        if (raw !== '') set(attributes, field.key, raw);
        break;
      }
      case 'text-list': {
        const items = scalar(values, field.key)
          .split(',')
          .map((item) => item.trim())
          .filter(Boolean);
        set(attributes, field.key, items);
        break;
      }
      case 'multi-choice': {
        const raw = values[field.key];
        const items = Array.isArray(raw) ? raw : [];
        if (items.length > 0 || !field.optional) set(attributes, field.key, items);
        break;
      }
      case 'connection': {
        const spec: Record<string, string> = {};
        for (const sub of connectionSubs) {
          const raw = scalar(values, `${field.key}.${sub}`);
          if (raw === '') continue;
          if (sub === 'seat' && !hasSeatForms(spec.family as Family)) continue; // a seat left over from another family
          spec[sub] = raw;
        }
        set(attributes, field.key, spec);
        break;
      }
      case 'seal': {
        const type = scalar(values, `${field.key}.type`);
        const value = scalar(values, `${field.key}.value`);
        // An adapter or plug without a seal leaves it out; a seal part must name one.
        if (type === 'o-ring') set(attributes, field.key, { type, as568: value });
        else if (type === 'crush-washer' || type === 'bonded-washer') set(attributes, field.key, { type, size: value });
        break;
      }
    }
  }
  return attributes;
}

export type AttributeCheck =
  | { ok: true; attributes: unknown }
  | { ok: false; errors: Record<string, string> };

function isBlank(values: AttributeValues, key: string): boolean {
  const value = values[key];
  return Array.isArray(value) ? value.length === 0 : (value ?? '').trim() === '';
}

/** The editor key an issue path belongs to ("a.size" → "a.size", "fluids.0" → "fluids", "fitsOd" → "fitsOd.minIn"). */
function keyForPath(kind: PartKind, path: string): string | undefined {
  const seal = attributeFields[kind].find((f) => f.type === 'seal' && path.startsWith(`${f.key}.`));
  if (seal && !path.endsWith('.type')) return `${seal.key}.value`;
  const keys = attributeFields[kind].flatMap(fieldKeys);
  return (
    keys.find((key) => key === path) ??
    keys.find((key) => path.startsWith(`${key}.`)) ??
    keys.find((key) => key.startsWith(`${path}.`))
  );
}

/** "Enter the max working pressure." for typed fields, "Choose the liner." for picked ones. */
function blankMessage(kind: PartKind, key: string): string {
  const field = attributeFields[kind].find((f) => key === f.key || key.startsWith(`${f.key}.`));
  if (!field) return `Enter ${key}.`;
  if (field.type === 'connection') return `Choose the ${key.split('.').at(-1)} of ${field.label.toLowerCase()}.`;
  const verb = field.type === 'number' || field.type === 'text' || field.type === 'text-list' ? 'Enter' : 'Choose';
  return `${verb} the ${field.label.toLowerCase()}.`;
}

/** Validates with the catalogue library's schema for the kind; messages keyed by editor key. */
export function checkAttributes(kind: PartKind, values: AttributeValues): AttributeCheck {
  const result = partAttributeSchemas[kind].safeParse(attributesFromValues(kind, values));
  if (result.success) return { ok: true, attributes: result.data };
  const errors: Record<string, string> = {};
  for (const issue of result.error.issues) {
    const key = keyForPath(kind, issue.path.map(String).join('.'));
    if (!key || errors[key] !== undefined) continue;
    errors[key] = isBlank(values, key) ? blankMessage(kind, key) : issue.message;
  }
  return { ok: false, errors };
}
