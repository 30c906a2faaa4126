import { StringDecoder } from 'node:string_decoder';
import { Readable, Transform, type TransformCallback } from 'node:stream';
import { createInflateRaw } from 'node:zlib';
import { PriceListFileError } from './price-list-errors.js';
import { ZIP_STORED, type ZipEntry } from './zip-inspection.js';

const LT = 0x3c; // <
const GT = 0x3e; // >
/** Stored entries are handed on in slices of this size, so no chunk is larger than zlib's would be. */
const STORED_SLICE_BYTES = 64 * 1024;

/**
 * Bytes really inflated, across every entry of one workbook. Two limits: the total, and the bytes
 * inflated since the reader last found something (a row with a value, a shared string), so a part
 * that runs on with nothing in it is stopped early instead of at the total.
 */
export class InflateBudget {
  private used = 0;
  private idle = 0;

  constructor(
    readonly limitBytes: number,
    readonly idleLimitBytes = limitBytes,
  ) {}

  get usedBytes(): number {
    return this.used;
  }

  /** Counts `bytes` more; throws once a limit is passed. */
  take(bytes: number): void {
    this.used += bytes;
    this.idle += bytes;
    if (this.used > this.limitBytes) {
      throw new PriceListFileError(
        `The workbook unpacks to more than ${megabytes(this.limitBytes)} MB of data, far more than a price list holds; it was refused.`,
      );
    }
    if (this.idle > this.idleLimitBytes) {
      throw new PriceListFileError(
        `The workbook holds more than ${megabytes(this.idleLimitBytes)} MB of data with no value in it, which no price list has; it was refused.`,
      );
    }
  }

  /** The reader found a value: the idle count starts again. */
  progress(): void {
    this.idle = 0;
  }
}

const megabytes = (bytes: number) => Math.round(bytes / (1024 * 1024));

export interface CountingOptions {
  /**
   * The longest run of bytes with no `<` or `>` (one text value or one tag): the XML parser keeps
   * such a run in memory whole, so a bomb of one endless value is stopped here rather than inside it.
   */
  maxTokenBytes: number;
}

/**
 * Counts every inflated byte against the budget before passing it on, and decodes UTF-8 across
 * chunk boundaries (a "Ø" split between two chunks stays one character). Emits strings.
 */
export class CountingDecoder extends Transform {
  private readonly decoder = new StringDecoder('utf8');
  private sinceMarkup = 0;

  constructor(
    private readonly budget: InflateBudget,
    private readonly options: CountingOptions,
  ) {
    super({ readableObjectMode: true });
  }

  override _transform(chunk: Buffer, _encoding: BufferEncoding, done: TransformCallback): void {
    try {
      this.budget.take(chunk.length);
      this.checkTokens(chunk);
    } catch (error) {
      done(error as Error);
      return;
    }
    const text = this.decoder.write(chunk);
    if (text) this.push(text);
    done();
  }

  override _flush(done: TransformCallback): void {
    const rest = this.decoder.end();
    if (rest) this.push(rest);
    done();
  }

  private checkTokens(chunk: Buffer): void {
    const first = firstMarkup(chunk);
    const run = first < 0 ? this.sinceMarkup + chunk.length : this.sinceMarkup + first;
    if (run > this.options.maxTokenBytes) {
      throw new PriceListFileError(
        `The workbook holds one value or tag longer than ${megabytes(this.options.maxTokenBytes)} MB, which no price list has; it was refused.`,
      );
    }
    this.sinceMarkup = first < 0 ? run : chunk.length - 1 - Math.max(chunk.lastIndexOf(LT), chunk.lastIndexOf(GT));
  }
}

function firstMarkup(chunk: Buffer): number {
  const lt = chunk.indexOf(LT);
  const gt = chunk.indexOf(GT);
  if (lt < 0) return gt;
  if (gt < 0) return lt;
  return Math.min(lt, gt);
}

function* slices(data: Buffer): Generator<Buffer> {
  for (let at = 0; at < data.length; at += STORED_SLICE_BYTES) yield data.subarray(at, Math.min(at + STORED_SLICE_BYTES, data.length));
}

/**
 * The text of one zip entry, inflated lazily (as the reader asks for it) and counted as it comes
 * out. Damaged deflate data and an exceeded budget end the stream with a `PriceListFileError`.
 */
export function openZipEntry(data: Buffer, entry: ZipEntry, budget: InflateBudget, options: CountingOptions): Readable {
  const compressed = data.subarray(entry.dataOffset, entry.dataOffset + entry.compressedBytes);
  const counter = new CountingDecoder(budget, options);
  // The reader listens once it starts; until then an early refusal must not go unheard.
  counter.on('error', () => undefined);
  const source = Readable.from(slices(compressed), { objectMode: false });
  source.on('error', (error) => counter.destroy(error));
  if (entry.method === ZIP_STORED) {
    source.pipe(counter);
    counter.on('close', () => source.destroy());
    return counter;
  }
  const inflater = createInflateRaw();
  inflater.on('error', () => counter.destroy(new PriceListFileError('The workbook cannot be read; it may be damaged. Save it again as .xlsx and retry.')));
  source.pipe(inflater).pipe(counter);
  counter.on('close', () => {
    source.destroy();
    inflater.destroy();
  });
  return counter;
}
