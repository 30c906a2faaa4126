import { produce, type Draft } from 'immer';
import type { CircuitDocument } from '@linesmith/routing';

/** Mutates a draft of the document; run through immer so the caller gets a new document or patches. */
export type Recipe<A> = (draft: Draft<CircuitDocument>, args: A) => void;

/** A pure command `(doc, args) → doc` that also carries its recipe, so history can record patches. */
export interface Command<A> {
  (doc: CircuitDocument, args: A): CircuitDocument;
  readonly recipe: Recipe<A>;
  readonly label: string;
}

export function command<A>(label: string, recipe: Recipe<A>): Command<A> {
  const run = (doc: CircuitDocument, args: A) => produce(doc, (draft) => recipe(draft, args));
  return Object.assign(run, { recipe, label });
}

/** Finds an item by id in a draft list or fails loudly: a command on a missing item is a bug in the caller. */
export function byId<T extends { id: string }>(items: T[], id: string, what: string): T {
  const item = items.find((i) => i.id === id);
  if (!item) throw new RangeError(`No ${what} "${id}" in the circuit`);
  return item;
}

export const newId = (): string => crypto.randomUUID();
