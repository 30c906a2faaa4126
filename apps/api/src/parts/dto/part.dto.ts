import type { Part } from '@linesmith/catalog';

/**
 * The API shape of a part: the catalogue library's `Part` (ids as strings, so `partSchema`
 * parses it) plus the row version that edits must quote.
 */
export type PartDto = Part & { version: number };
