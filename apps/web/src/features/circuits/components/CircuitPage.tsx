import {
  Button,
  MessageBar,
  MessageBarActions,
  MessageBarBody,
  Spinner,
  Tab,
  TabList,
  Text,
  makeStyles,
  tokens,
} from '@fluentui/react-components';
import { circuitKinds } from '@linesmith/routing';
import { Suspense, lazy } from 'react';
import { useParams, useSearchParams } from 'react-router-dom';
import { ApiError } from '../../../lib/api-error';
import { PageTrail } from '../../builds/components/PageTrail';
import { useBuild } from '../../builds/hooks/useBuild';
import { vehicleTitle } from '../../builds/utils/vehicle-title';
import { NotFoundPage } from '../../shell/components/NotFoundPage';
import { SafetyNote } from '../../shell/components/SafetyNote';
import { useCircuit } from '../hooks/useCircuit';
import { fluidLabels, needsSafetyNote } from '../utils/fluid-labels';
import { CircuitRatings } from './CircuitRatings';
import { CircuitStatusBadge } from './CircuitStatusBadge';
import { CutListTab } from './CutListTab';
import { RevisionsTab } from './RevisionsTab';
import { RevisionLinks } from '../../reviews/components/RevisionLinks';
import { SubmitForReviewButton } from '../../reviews/components/SubmitForReviewButton';

/** The sketch (and later its editor) is the heaviest part of the app: its own chunk. */
const SketchTab = lazy(() => import('../../sketch/components/SketchTab').then((m) => ({ default: m.SketchTab })));
const CircuitReviewTab = lazy(() =>
  import('../../reviews/components/CircuitReviewTab').then((m) => ({ default: m.CircuitReviewTab })),
);

const tabs = { sketch: 'Sketch', 'cut-list': 'Cut list and parts', revisions: 'Revisions', review: 'Review' } as const;
type TabKey = keyof typeof tabs;
const isTab = (value: string | null): value is TabKey => value !== null && value in tabs;

const useStyles = makeStyles({
  page: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalM },
  header: { display: 'flex', flexWrap: 'wrap', alignItems: 'center', gap: tokens.spacingHorizontalL },
  facts: { display: 'flex', flexWrap: 'wrap', gap: tokens.spacingHorizontalL, color: tokens.colorNeutralForeground2 },
});

/** One circuit: header with its ratings, then the Sketch, Cut list and parts, and Revisions tabs. */
export function CircuitPage() {
  const styles = useStyles();
  const { circuitId = '' } = useParams();
  const [searchParams, setSearchParams] = useSearchParams();
  const tabParam = searchParams.get('tab');
  const tab: TabKey = isTab(tabParam) ? tabParam : 'sketch';
  const circuit = useCircuit(circuitId);
  const build = useBuild(circuit.data?.buildId ?? '');

  if (circuit.isPending) return <Spinner label="Loading the circuit…" />;
  if (circuit.isError) {
    if (circuit.error instanceof ApiError && circuit.error.status === 404) return <NotFoundPage />;
    return (
      <MessageBar intent="error" role="alert">
        <MessageBarBody>The circuit could not be loaded: {circuit.error.message}</MessageBarBody>
        <MessageBarActions>
          <Button onClick={() => void circuit.refetch()}>Try again</Button>
        </MessageBarActions>
      </MessageBar>
    );
  }

  const c = circuit.data;
  const buildTitle = build.data ? vehicleTitle(build.data.vehicle) || 'Unnamed vehicle' : 'Build';
  return (
    <article className={styles.page} aria-labelledby="circuit-title">
      <PageTrail
        steps={[
          { label: 'Builds', to: '/builds' },
          { label: build.data ? `${buildTitle} — ${build.data.customer.name}` : buildTitle, to: `/builds/${encodeURIComponent(c.buildId)}` },
          { label: c.name },
        ]}
      />
      <div className={styles.header}>
        <Text as="h1" id="circuit-title" size={700} weight="semibold">
          {c.name}
        </Text>
        <CircuitStatusBadge status={c.status} />
        <SubmitForReviewButton circuit={c} />
      </div>
      <Text className={styles.facts}>
        <span>Kind: {circuitKinds[c.kind].label}</span>
        <span>Fluid: {fluidLabels[c.fluid]}</span>
        <span>
          Max: <CircuitRatings maxPressurePsi={c.maxPressurePsi} maxTempF={c.maxTempF} />
        </span>
      </Text>
      {needsSafetyNote(c.fluid) && <SafetyNote />}

      <TabList
        selectedValue={tab}
        onTabSelect={(_, data) => {
          const next = String(data.value);
          setSearchParams(next === 'sketch' ? {} : { tab: next }, { replace: true });
        }}
        aria-label="Circuit views"
      >
        {Object.entries(tabs).map(([key, label]) => (
          <Tab key={key} value={key}>
            {label}
          </Tab>
        ))}
      </TabList>
      <div role="tabpanel" aria-label={tabs[tab]}>
        {tab === 'sketch' && (
          <Suspense fallback={<Spinner label="Loading the sketch…" />}>
            <SketchTab circuit={c} />
          </Suspense>
        )}
        {tab === 'cut-list' && <CutListTab circuitId={c.id} />}
        {tab === 'revisions' && <RevisionLinks circuitId={c.id} />}
        {tab === 'revisions' && <RevisionsTab circuitId={c.id} />}
        {tab === 'review' && (
          <Suspense fallback={<Spinner label="Loading the review…" />}>
            <CircuitReviewTab circuitId={c.id} />
          </Suspense>
        )}
      </div>
    </article>
  );
}
