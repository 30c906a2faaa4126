import {
  Button,
  Dropdown,
  Field,
  MessageBar,
  MessageBarActions,
  MessageBarBody,
  Option,
  Spinner,
  Text,
  makeStyles,
  tokens,
} from '@fluentui/react-components';
import { useParams, useSearchParams } from 'react-router-dom';
import { PageTrail } from '../../builds/components/PageTrail';
import { useCircuit } from '../../circuits/hooks/useCircuit';
import { useRevisions } from '../../circuits/hooks/useRevisions';
import { SketchPreview } from '../../sketch/components/SketchPreview';
import { parseRevisionRef, type ComparisonResult, type RevisionRef } from '../api/comparison-schema';
import { useComparison } from '../hooks/useComparison';
import { describeChanges } from '../utils/change-descriptions';
import { ChangeList } from './ChangeList';

const useStyles = makeStyles({
  page: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalM },
  pickers: { display: 'flex', flexWrap: 'wrap', gap: tokens.spacingHorizontalL, alignItems: 'end' },
  sides: { display: 'flex', flexWrap: 'wrap', gap: tokens.spacingHorizontalL },
  side: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalXS },
  frame: { border: `${tokens.strokeWidthThin} solid ${tokens.colorNeutralStroke2}` },
});

const refLabel = (ref: RevisionRef) => (ref === 'draft' ? 'Working draft' : `Revision ${ref}`);

/** Two revisions (or a revision and the draft) side by side, with what changed (`/circuits/:id/compare?from=&to=`). */
export function ComparePage() {
  const styles = useStyles();
  const { circuitId = '' } = useParams();
  const [params, setParams] = useSearchParams();
  const circuit = useCircuit(circuitId);
  const revisions = useRevisions(circuitId);
  const numbers = (revisions.data ?? []).map((r) => r.number).sort((a, b) => b - a);
  const to = parseRevisionRef(params.get('to')) ?? 'draft';
  const from = parseRevisionRef(params.get('from')) ?? numbers.find((n) => to === 'draft' || n < to) ?? null;
  const choices: RevisionRef[] = ['draft', ...numbers];
  const pick = (key: 'from' | 'to', value: RevisionRef) =>
    setParams({ from: String(key === 'from' ? value : (from ?? '')), to: String(key === 'to' ? value : to) }, { replace: true });

  return (
    <article className={styles.page} aria-labelledby="compare-title">
      <PageTrail
        steps={[
          { label: 'Builds', to: '/builds' },
          { label: circuit.data?.name ?? 'Circuit', to: `/circuits/${encodeURIComponent(circuitId)}?tab=revisions` },
          { label: 'Compare revisions' },
        ]}
      />
      <Text as="h1" id="compare-title" size={700} weight="semibold">
        What changed{circuit.data ? `: ${circuit.data.name}` : ''}
      </Text>
      <div className={styles.pickers}>
        {(['from', 'to'] as const).map((key) => {
          const current = key === 'from' ? from : to;
          return (
            <Field key={key} label={key === 'from' ? 'From' : 'To'}>
              <Dropdown
                aria-label={key === 'from' ? 'Compare from' : 'Compare to'}
                value={current === null ? '' : refLabel(current)}
                selectedOptions={current === null ? [] : [String(current)]}
                placeholder="Pick a revision"
                onOptionSelect={(_, d) => {
                  const ref = parseRevisionRef(d.optionValue ?? null);
                  if (ref !== null) pick(key, ref);
                }}
              >
                {choices.map((ref) => (
                  <Option key={String(ref)} value={String(ref)}>
                    {refLabel(ref)}
                  </Option>
                ))}
              </Dropdown>
            </Field>
          );
        })}
      </div>
      {revisions.isPending && <Spinner size="small" label="Loading revisions…" />}
      {revisions.data && from === null && <Text as="p">There is no saved revision to compare with yet.</Text>}
      {from !== null && <Comparison circuitId={circuitId} from={from} to={to} />}
    </article>
  );
}

function Comparison({ circuitId, from, to }: { circuitId: string; from: RevisionRef; to: RevisionRef }) {
  const comparison = useComparison(circuitId, from, to);
  if (comparison.isPending) return <Spinner label="Comparing…" />;
  if (comparison.isError) {
    return (
      <MessageBar intent="error" role="alert">
        <MessageBarBody>The revisions could not be compared: {comparison.error.message}</MessageBarBody>
        <MessageBarActions>
          <Button onClick={() => void comparison.refetch()}>Try again</Button>
        </MessageBarActions>
      </MessageBar>
    );
  }
  return <ComparisonView result={comparison.data} from={from} to={to} />;
}

export function ComparisonView({ result, from, to }: { result: ComparisonResult; from: RevisionRef; to: RevisionRef }) {
  const styles = useStyles();
  const changed = result.comparison.changedIds;
  return (
    <>
      <section aria-labelledby="changes-title">
        <Text as="h2" id="changes-title" size={500} weight="semibold">
          Changes from {refLabel(from).toLowerCase()} to {refLabel(to).toLowerCase()}
        </Text>
        <ChangeList groups={describeChanges(result)} />
      </section>
      <div className={styles.sides}>
        {([
          [from, result.before],
          [to, result.after],
        ] as const).map(([ref, side]) => (
          <figure key={String(ref)} className={styles.side} style={{ margin: 0 }}>
            <figcaption>
              <Text weight="semibold">{refLabel(ref)}</Text> (changed items highlighted)
            </figcaption>
            <div className={styles.frame}>
              <SketchPreview document={side.document} evaluation={side.evaluation} highlightIds={changed} width={520} height={360} label={refLabel(ref)} />
            </div>
          </figure>
        ))}
      </div>
    </>
  );
}
