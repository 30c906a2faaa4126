import {
  canonicalSize,
  fitsOd,
  hoseEndFitsHose,
  parseDash,
  parseFractionIn,
  partConnections,
  type ConnectionSpec,
  type Family,
  type HosePart,
  type Part,
  type PartKind,
} from '@linesmith/catalog';

export interface PartFilter {
  kind?: PartKind;
  family?: Family;
  size?: string;
  dash?: number;
  supplierId?: string;
  search?: string;
  includeRetired: boolean;
  /** Keep the hose ends that fit this hose and the clamps and sleeves that fit its OD. */
  fitsHose?: HosePart;
}

export type PartSortKey = 'description' | 'kind' | 'supplierPartNumber' | 'priceCents' | 'stockOnHand';

/**
 * The tube size of an end in sixteenths of an inch: dash families name it, flare families and
 * inch quick-connects name the tube OD in inches (a dash size is the tube OD in sixteenths, DOMAIN §1).
 */
function dashOfEnd(end: ConnectionSpec): number | undefined {
  switch (end.family) {
    case 'flare37':
    case 'orb':
    case 'orfs':
    case 'barb':
      return parseDash(end.size);
    case 'flare45':
    case 'invflare45':
    case 'qc': {
      const tubeOdIn = parseFractionIn(end.size);
      return tubeOdIn === undefined ? undefined : tubeOdIn * 16;
    }
    default:
      return undefined;
  }
}

function dashesOf(part: Part): number[] {
  const ends = partConnections(part).map(dashOfEnd);
  if (part.kind === 'hose') return [part.attributes.dash];
  if (part.kind === 'hose-end') return [part.attributes.hoseDash, ...ends].filter((d) => d !== undefined);
  return ends.filter((d) => d !== undefined);
}

function matchesEnds(part: Part, family: Family | undefined, size: string | undefined): boolean {
  if (family === undefined && size === undefined) return true;
  return partConnections(part).some(
    (end) =>
      (family === undefined || end.family === family) &&
      (size === undefined || end.size === canonicalSize(end.family, size)),
  );
}

function fitsTheHose(part: Part, hose: HosePart): boolean {
  if (part.kind === 'hose-end') return hoseEndFitsHose(part, hose);
  if (part.kind === 'clamp' || part.kind === 'sleeve') return fitsOd(part, hose.attributes.odIn);
  return false;
}

function matchesSearch(part: Part, search: string): boolean {
  const text = `${part.description} ${part.supplierPartNumber}`.toLowerCase();
  return search
    .toLowerCase()
    .split(/\s+/)
    .filter(Boolean)
    .every((word) => text.includes(word));
}

export function matchesPartFilter(part: Part, filter: PartFilter): boolean {
  if (!filter.includeRetired && part.retired) return false;
  if (filter.kind && part.kind !== filter.kind) return false;
  if (filter.supplierId && part.supplierId !== filter.supplierId) return false;
  if (!matchesEnds(part, filter.family, filter.size)) return false;
  if (filter.dash !== undefined && !dashesOf(part).includes(filter.dash)) return false;
  if (filter.fitsHose && !fitsTheHose(part, filter.fitsHose)) return false;
  if (filter.search && !matchesSearch(part, filter.search)) return false;
  return true;
}

// Numeric collation so "-10 hose" sorts after "-8 hose".
const collator = new Intl.Collator('en', { numeric: true, sensitivity: 'base' });

function compareBy(key: PartSortKey, a: Part, b: Part): number {
  const x = a[key];
  const y = b[key];
  return typeof x === 'number' && typeof y === 'number' ? x - y : collator.compare(String(x), String(y));
}

/** A sorted copy; ties fall back to description, then id, so pages never overlap. */
export function sortParts<T extends Part>(parts: readonly T[], key: PartSortKey, direction: 'asc' | 'desc'): T[] {
  const sign = direction === 'asc' ? 1 : -1;
  return [...parts].sort(
    (a, b) => sign * compareBy(key, a, b) || collator.compare(a.description, b.description) || (a.id < b.id ? -1 : a.id > b.id ? 1 : 0),
  );
}
