import type { ApiClient } from '../../../lib/api-client';
import { postMultipart } from './post-multipart';
import { priceCommitSchema, pricePreviewSchema, type CsvReadingChoice, type PriceListMapping } from './price-list-schemas';

export interface PriceListRequest {
  client: ApiClient;
  file: File;
  supplierId: string;
  /** Left out on the first look at a file: the API then guesses one from the header row. */
  mapping?: PriceListMapping;
  /** A CSV's encoding and separator when the user overrides what the API detected. */
  csv?: CsvReadingChoice;
  onProgress?(fraction: number): void;
}

function fields({ file, supplierId, mapping, csv }: PriceListRequest): Record<string, string | Blob> {
  const result: Record<string, string | Blob> = { supplierId, file };
  if (mapping) result.mapping = JSON.stringify(mapping);
  if (csv?.encoding) result.encoding = csv.encoding;
  if (csv?.delimiter) result.delimiter = csv.delimiter;
  return result;
}

export function previewPriceList(request: PriceListRequest) {
  return postMultipart({
    client: request.client,
    path: '/api/price-lists/preview',
    fields: fields(request),
    schema: pricePreviewSchema,
    onProgress: request.onProgress,
    fallbackMessage: 'The price list could not be read.',
  });
}

export function commitPriceList(request: PriceListRequest) {
  return postMultipart({
    client: request.client,
    path: '/api/price-lists/commit',
    fields: fields(request),
    schema: priceCommitSchema,
    onProgress: request.onProgress,
    fallbackMessage: 'The price list could not be imported.',
  });
}
