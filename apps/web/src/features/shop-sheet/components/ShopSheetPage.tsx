import { Button, MessageBar, MessageBarActions, MessageBarBody, Spinner, Text, makeStyles, tokens } from '@fluentui/react-components';
import { PrintRegular } from '@fluentui/react-icons';
import { formatPressure, formatTemperature } from '@linesmith/routing';
import { Link, useParams } from 'react-router-dom';
import { vehicleTitle } from '../../builds/utils/vehicle-title';
import { fluidLabels } from '../../circuits/utils/fluid-labels';
import { NotFoundPage } from '../../shell/components/NotFoundPage';
import { SafetyNote } from '../../shell/components/SafetyNote';
import { SketchPreview } from '../../sketch/components/SketchPreview';
import { useShopSheetData } from '../hooks/useShopSheetData';
import { assemblyNotesFor } from '../utils/assembly-notes';
import { familiesPresent } from '../utils/families-present';
import { AssemblyNotes } from './AssemblyNotes';
import './shop-sheet-print.css';
import { SheetCutList } from './SheetCutList';
import { SignOffBlock } from './SignOffBlock';

const useStyles = makeStyles({
  sheet: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalL, maxWidth: '1000px' },
  toolbar: { display: 'flex', gap: tokens.spacingHorizontalM, alignItems: 'center' },
  facts: { display: 'flex', flexWrap: 'wrap', gap: tokens.spacingHorizontalL },
  sketch: { border: '1px solid #6b7280', alignSelf: 'flex-start' },
  link: { color: tokens.colorBrandForegroundLink },
});

/** The printable shop sheet of one revision (`/circuits/:id/revisions/:number/sheet`). */
export function ShopSheetPage() {
  const styles = useStyles();
  const { circuitId = '', number = '' } = useParams();
  const revision = /^\d+$/.test(number) ? Number(number) : NaN;
  const { circuit, build, saved, evaluation, audit, parts, signOff } = useShopSheetData(circuitId, Number.isFinite(revision) ? revision : 0);

  if (!Number.isFinite(revision) || revision < 1) return <NotFoundPage />;
  const failed = [circuit, saved, evaluation, audit].find((q) => q.isError);
  if (failed?.error) {
    return (
      <MessageBar intent="error" role="alert">
        <MessageBarBody>The shop sheet could not be prepared: {failed.error.message}</MessageBarBody>
        <MessageBarActions>
          <Button onClick={() => void failed.refetch()}>Try again</Button>
        </MessageBarActions>
      </MessageBar>
    );
  }
  if (!circuit.data || !saved.data || !evaluation.data || !audit.data) return <Spinner label="Preparing the shop sheet…" />;

  const c = circuit.data;
  const doc = saved.data.document;
  const vehicle = build.data ? vehicleTitle(build.data.vehicle) : '';
  return (
    <article className={styles.sheet} aria-labelledby="sheet-title" data-shop-sheet>
      <div className={styles.toolbar} data-print-hide>
        <Button appearance="primary" icon={<PrintRegular />} onClick={() => window.print()}>
          Print
        </Button>
        <Link className={styles.link} to={`/circuits/${encodeURIComponent(c.id)}?tab=revisions`}>
          Back to the circuit
        </Link>
      </div>
      {/* Not a <header>: print hides the app's top bar by that element. */}
      <div data-sheet-section>
        <Text as="h1" id="sheet-title" size={700} weight="semibold">
          Shop sheet: {c.name} — revision {revision}
        </Text>
        <Text as="p" className={styles.facts}>
          {build.data && (
            <span>
              Build: {vehicle || 'Unnamed vehicle'} — {build.data.customer.name}
            </span>
          )}
          <span>Fluid: {fluidLabels[doc.circuit.fluid]}</span>
          <span>
            Max: {formatPressure(doc.circuit.maxPressurePsi, 'psi')} · {formatTemperature(doc.circuit.maxTempF, 'F')}
          </span>
        </Text>
      </div>
      <SignOffBlock revision={revision} signOff={signOff} />
      <section aria-label="Sketch" data-sheet-section>
        <div className={styles.sketch}>
          <SketchPreview document={doc} evaluation={evaluation.data} width={700} height={440} label={`Revision ${revision}`} />
        </div>
      </section>
      <section aria-labelledby="sheet-cut-list-title" data-sheet-break>
        <Text as="h2" id="sheet-cut-list-title" size={500} weight="semibold">
          Cut list
        </Text>
        <SheetCutList document={doc} evaluation={evaluation.data} parts={parts} />
      </section>
      <AssemblyNotes families={assemblyNotesFor(familiesPresent(doc, parts))} />
      <section data-sheet-section>
        <SafetyNote />
      </section>
    </article>
  );
}
