import {
  Button,
  Field,
  MessageBar,
  MessageBarBody,
  ProgressBar,
  Select,
  Text,
  makeStyles,
  tokens,
} from '@fluentui/react-components';
import { ArrowUploadRegular } from '@fluentui/react-icons';
import { useQueryClient } from '@tanstack/react-query';
import { useId, useState, type ChangeEvent } from 'react';
import { ApiError } from '../../../lib/api-error';
import { describeError } from '../../../lib/describe-error';
import { useApiClient } from '../../../lib/useApiClient';
import { catalogueKeys } from '../api/catalogue-keys';
import { commitPriceList, previewPriceList } from '../api/price-list-requests';
import {
  mappingFieldLabels,
  priceListMappingFields,
  reportBodySchema,
  requiredMappingFields,
  type CsvReadingChoice,
  type ImportCounts,
  type ImportIssue,
  type PriceListMapping,
  type PricePreview,
} from '../api/price-list-schemas';
import type { Supplier } from '../api/supplier-schema';
import { checkPriceListFile } from '../utils/check-price-list-file';
import { CsvReadingFields } from './CsvReadingFields';
import { ImportCountsSummary } from './ImportCountsSummary';
import { ImportReportTable } from './ImportReportTable';

export interface PriceListImportProps {
  suppliers: readonly Supplier[];
}

type Step = 'choose' | 'map' | 'checked' | 'done';

const useStyles = makeStyles({
  root: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalM, maxWidth: '880px' },
  row: { display: 'flex', flexWrap: 'wrap', alignItems: 'flex-end', gap: tokens.spacingHorizontalL },
  mapping: { display: 'grid', gridTemplateColumns: 'repeat(auto-fill, minmax(200px, 1fr))', gap: tokens.spacingHorizontalM },
  actions: { display: 'flex', gap: tokens.spacingHorizontalS },
});

/**
 * Price-list import in three steps: choose the supplier and file (the API guesses the columns and,
 * for a CSV, its text encoding and separator, which can be changed), map the columns and dry-run (row-by-row report, nothing written), then import all or nothing.
 */
export function PriceListImport({ suppliers }: PriceListImportProps) {
  const styles = useStyles();
  const client = useApiClient();
  const queryClient = useQueryClient();
  const [step, setStep] = useState<Step>('choose');
  const [supplierId, setSupplierId] = useState('');
  const [file, setFile] = useState<File | null>(null);
  const [fileError, setFileError] = useState<string | null>(null);
  const [preview, setPreview] = useState<PricePreview | null>(null);
  const [mapping, setMapping] = useState<PriceListMapping>({});
  const [csv, setCsv] = useState<CsvReadingChoice>({});
  const [report, setReport] = useState<ImportIssue[]>([]);
  const [result, setResult] = useState<ImportCounts | null>(null);
  const [progress, setProgress] = useState<number | null>(null);
  const [error, setError] = useState<string | null>(null);
  const busy = progress !== null;
  const fileInputId = useId();

  function chooseFile(event: ChangeEvent<HTMLInputElement>) {
    const chosen = event.target.files?.[0] ?? null;
    setFile(chosen);
    setFileError(chosen ? checkPriceListFile(chosen) : null);
    setCsv({});
    setStep('choose');
    setPreview(null);
    setReport([]);
  }

  async function run<T>(work: () => Promise<T>): Promise<T | undefined> {
    setError(null);
    setProgress(0);
    try {
      return await work();
    } catch (cause) {
      const refused = cause instanceof ApiError ? reportBodySchema.safeParse(cause.body) : null;
      if (refused?.success) setReport(refused.data.report);
      setError(describeError(cause, 'The price list could not be read.'));
      return undefined;
    } finally {
      setProgress(null);
    }
  }

  /** A first look (again, with `choice` when the encoding or separator was changed): columns and a guessed mapping. */
  async function readFile(choice: CsvReadingChoice) {
    if (!file || !supplierId || checkPriceListFile(file)) return;
    setCsv(choice);
    const answer = await run(() => previewPriceList({ client, file, supplierId, csv: choice, onProgress: setProgress }));
    if (!answer) return;
    setPreview(answer);
    setMapping(answer.mapping);
    setReport([]);
    setStep('map');
  }

  async function dryRun() {
    if (!file) return;
    const answer = await run(() => previewPriceList({ client, file, supplierId, mapping, csv, onProgress: setProgress }));
    if (!answer) return;
    setPreview(answer);
    setReport(answer.report);
    setStep('checked');
  }

  async function commit() {
    if (!file) return;
    const counts = await run(() => commitPriceList({ client, file, supplierId, mapping, csv, onProgress: setProgress }));
    if (!counts) return;
    setResult(counts);
    setStep('done');
    await queryClient.invalidateQueries({ queryKey: catalogueKeys.parts() });
  }

  const missing = requiredMappingFields.filter((field) => !mapping[field]);
  const canCommit = step === 'checked' && preview !== null && preview.counts.errors === 0 && report.length === 0;

  return (
    <div className={styles.root}>
      <Text as="p">
        Prices and descriptions of parts already in the catalogue are updated from the supplier&apos;s list (.xlsx or .csv, at most
        5 MB and 20,000 rows; a CSV may be separated by commas, semicolons or tabs, in any common text encoding). Part numbers the catalogue does not know are reported: add new parts in the part editor, where their ratings are
        entered.
      </Text>
      <div className={styles.row}>
        <Field label="Supplier" required>
          <Select value={supplierId} onChange={(_, d) => setSupplierId(d.value)} disabled={busy}>
            <option value="">Choose…</option>
            {suppliers.map((s) => (
              <option key={s.id} value={s.id}>
                {s.name}
              </option>
            ))}
          </Select>
        </Field>
        <Field label={{ children: 'Price list file', htmlFor: fileInputId }} required validationMessage={fileError}>
          <input id={fileInputId} type="file" accept=".xlsx,.csv,application/vnd.openxmlformats-officedocument.spreadsheetml.sheet,text/csv" onChange={chooseFile} disabled={busy} />
        </Field>
        <Button icon={<ArrowUploadRegular />} disabled={!file || !supplierId || fileError !== null || busy} onClick={() => void readFile({})}>
          Read columns
        </Button>
      </div>

      {progress !== null && (
        <Field label="Sending the file…" validationState="none">
          <ProgressBar value={progress} max={1} aria-label="Upload progress" />
        </Field>
      )}
      {error && (
        <MessageBar intent="error" role="alert">
          <MessageBarBody>{error}</MessageBarBody>
        </MessageBar>
      )}

      {preview && step !== 'done' && (
        <>
          <CsvReadingFields readAs={preview.readAs} choice={csv} disabled={busy} onChange={(choice) => void readFile(choice)} />
          <Text weight="semibold">Columns</Text>
          <div className={styles.mapping}>
            {priceListMappingFields.map((field) => (
              <Field key={field} label={mappingFieldLabels[field]} required={requiredMappingFields.includes(field)}>
                <Select
                  value={mapping[field] ?? ''}
                  disabled={busy}
                  onChange={(_, d) => {
                    setMapping((m) => ({ ...m, [field]: d.value || undefined }));
                    setStep('map');
                  }}
                >
                  <option value="">Not in this file</option>
                  {preview.headers.map((header) => (
                    <option key={header} value={header}>
                      {header}
                    </option>
                  ))}
                </Select>
              </Field>
            ))}
          </div>
          {missing.length > 0 && (
            <Text role="status">Choose the column of: {missing.map((f) => mappingFieldLabels[f].toLowerCase()).join(', ')}.</Text>
          )}
          <div className={styles.actions}>
            <Button disabled={busy || missing.length > 0} onClick={() => void dryRun()}>
              Check the rows (dry run)
            </Button>
            <Button appearance="primary" disabled={busy || !canCommit} onClick={() => void commit()}>
              Import
            </Button>
          </div>
          {step === 'checked' && <ImportCountsSummary counts={preview.counts} />}
          {step === 'checked' && report.length === 0 && <Text>No problems found: the list can be imported.</Text>}
        </>
      )}
      {report.length > 0 && (
        <>
          <Text weight="semibold">
            {report.length} {report.length === 1 ? 'problem' : 'problems'}: fix them in the file and check again. Nothing is imported while a
            row has a problem.
          </Text>
          <ImportReportTable report={report} />
        </>
      )}
      {step === 'done' && result && (
        <MessageBar intent="success">
          <MessageBarBody>
            Imported: {result.new} new, {result.updated} updated, {result.unchanged} unchanged.
          </MessageBarBody>
        </MessageBar>
      )}
    </div>
  );
}
