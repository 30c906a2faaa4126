import { Readable } from 'node:stream';
import { deflateRawSync } from 'node:zlib';
import { CountingDecoder, InflateBudget, openZipEntry } from './inflate-budget.js';
import { ZIP_DEFLATED, ZIP_STORED } from './zip-inspection.js';

async function textOf(stream: Readable): Promise<string> {
  let text = '';
  for await (const chunk of stream) text += chunk as string;
  return text;
}

const entryOf = (data: Buffer, method: number) => ({ name: 'part.xml', method, compressedBytes: data.length, declaredBytes: 1, dataOffset: 0 });
const options = { maxTokenBytes: 1024 };

describe('InflateBudget', () => {
  it('counts every byte taken and refuses past the total', () => {
    const budget = new InflateBudget(10);
    budget.take(4);
    budget.take(6);
    expect(budget.usedBytes).toBe(10);
    expect(() => budget.take(1)).toThrow(/more than 0 MB of data/);
  });

  it('refuses a run with no progress, and progress starts the idle count again', () => {
    const budget = new InflateBudget(100, 10);
    budget.take(8);
    budget.progress();
    budget.take(8);
    expect(() => budget.take(3)).toThrow(/with no value in it/);
  });
});

describe('CountingDecoder', () => {
  it('passes text on, decoding a character split between chunks', async () => {
    const bytes = Buffer.from('<t>Ø 3/8</t>');
    const at = bytes.indexOf(Buffer.from('Ø')) + 1; // between the two bytes of "Ø" in UTF-8
    const budget = new InflateBudget(1000);
    const decoder = Readable.from([bytes.subarray(0, at), bytes.subarray(at)], { objectMode: false }).pipe(new CountingDecoder(budget, options));
    expect(await textOf(decoder)).toBe('<t>Ø 3/8</t>');
    expect(budget.usedBytes).toBe(bytes.length);
  });

  it('refuses a run longer than the token limit, across chunks', async () => {
    const chunks = ['<t>', 'a'.repeat(600), 'a'.repeat(600), '</t>'].map((text) => Buffer.from(text));
    const decoder = Readable.from(chunks, { objectMode: false }).pipe(new CountingDecoder(new InflateBudget(1e6), options));
    await expect(textOf(decoder)).rejects.toThrow(/longer than 0 MB/);
    const fine = ['<t>', 'a'.repeat(600), '</t><t>', 'a'.repeat(600), '</t>'].map((text) => Buffer.from(text));
    expect(await textOf(Readable.from(fine, { objectMode: false }).pipe(new CountingDecoder(new InflateBudget(1e6), options)))).toHaveLength(1214);
  });
});

describe('openZipEntry', () => {
  it('inflates deflated and passes on stored entries', async () => {
    const text = '<row>' + 'Dörr '.repeat(50_000) + '</row>';
    const deflated = deflateRawSync(Buffer.from(text));
    expect(await textOf(openZipEntry(deflated, entryOf(deflated, ZIP_DEFLATED), new InflateBudget(1e7), { maxTokenBytes: 1e6 }))).toBe(text);
    const stored = Buffer.from(text);
    expect(await textOf(openZipEntry(stored, entryOf(stored, ZIP_STORED), new InflateBudget(1e7), { maxTokenBytes: 1e6 }))).toBe(text);
  });

  it('stops inflating at the budget, whatever the entry says it holds', async () => {
    // 64 MB of tags deflate to ~65 kB; the entry declares 1 byte.
    const deflated = deflateRawSync(Buffer.from('<x/>'.repeat(16 * 1024 * 1024)));
    const budget = new InflateBudget(1024 * 1024);
    const before = process.memoryUsage().rss;
    await expect(textOf(openZipEntry(deflated, entryOf(deflated, ZIP_DEFLATED), budget, { maxTokenBytes: 1e6 }))).rejects.toThrow(/unpacks to more than 1 MB/);
    // zlib hands out 16 kB at a time: the count stops within one chunk of the budget.
    expect(budget.usedBytes).toBeLessThanOrEqual(1024 * 1024 + 64 * 1024);
    expect(process.memoryUsage().rss - before).toBeLessThan(50 * 1024 * 1024);
  });

  it('ends with a clear refusal on damaged deflate data', async () => {
    const damaged = Buffer.concat([deflateRawSync(Buffer.from('<row/>'.repeat(1000))).subarray(0, 10), Buffer.alloc(20, 0xff)]);
    await expect(textOf(openZipEntry(damaged, entryOf(damaged, ZIP_DEFLATED), new InflateBudget(1e6), options))).rejects.toThrow(/cannot be read/);
  });
});
