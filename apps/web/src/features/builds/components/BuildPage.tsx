import {
  Button,
  MessageBar,
  MessageBarActions,
  MessageBarBody,
  Spinner,
  Text,
  makeStyles,
  tokens,
} from '@fluentui/react-components';
import { AddRegular } from '@fluentui/react-icons';
import { useState } from 'react';
import { useParams } from 'react-router-dom';
import { ApiError } from '../../../lib/api-error';
import { BuildCircuitsTable } from '../../circuits/components/BuildCircuitsTable';
import { CreateCircuitDialog } from '../../circuits/components/CreateCircuitDialog';
import { useBuildCircuits } from '../../circuits/hooks/useBuildCircuits';
import { NotFoundPage } from '../../shell/components/NotFoundPage';
import { useBuild } from '../hooks/useBuild';
import { vehicleTitle } from '../utils/vehicle-title';
import { BuildDetailsPanel } from './BuildDetailsPanel';
import { BuildFormDialog } from './BuildFormDialog';
import { PageTrail } from './PageTrail';
import { PhotoGallery } from './PhotoGallery';

const useStyles = makeStyles({
  page: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalL },
  sectionHeader: { display: 'flex', alignItems: 'center', justifyContent: 'space-between', gap: tokens.spacingHorizontalM },
  section: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalS },
});

/** One build: vehicle and customer, its circuits with their status and flags, and its photos. */
export function BuildPage() {
  const styles = useStyles();
  const { buildId = '' } = useParams();
  const build = useBuild(buildId);
  const circuits = useBuildCircuits(buildId);
  const [editing, setEditing] = useState(false);
  const [creatingCircuit, setCreatingCircuit] = useState(false);

  if (build.isPending) return <Spinner label="Loading the build…" />;
  if (build.isError) {
    if (build.error instanceof ApiError && build.error.status === 404) return <NotFoundPage />;
    return (
      <MessageBar intent="error" role="alert">
        <MessageBarBody>The build could not be loaded: {build.error.message}</MessageBarBody>
        <MessageBarActions>
          <Button onClick={() => void build.refetch()}>Try again</Button>
        </MessageBarActions>
      </MessageBar>
    );
  }

  const title = vehicleTitle(build.data.vehicle) || 'Unnamed vehicle';
  return (
    <article className={styles.page} aria-labelledby="build-title">
      <PageTrail steps={[{ label: 'Builds', to: '/builds' }, { label: title }]} />
      <Text as="h1" id="build-title" size={700} weight="semibold">
        {title} — {build.data.customer.name}
      </Text>

      <BuildDetailsPanel build={build.data} onEdit={() => setEditing(true)} />

      <section className={styles.section} aria-labelledby="circuits-title">
        <div className={styles.sectionHeader}>
          <Text as="h2" id="circuits-title" size={500} weight="semibold">
            Circuits
          </Text>
          <Button icon={<AddRegular />} appearance="primary" onClick={() => setCreatingCircuit(true)}>
            New circuit
          </Button>
        </div>
        {circuits.isPending && <Spinner size="small" label="Loading circuits…" />}
        {circuits.isError && (
          <MessageBar intent="error" role="alert">
            <MessageBarBody>The circuits could not be loaded: {circuits.error.message}</MessageBarBody>
            <MessageBarActions>
              <Button onClick={() => void circuits.refetch()}>Try again</Button>
            </MessageBarActions>
          </MessageBar>
        )}
        {circuits.data && circuits.data.length === 0 && (
          <Text as="p">No circuits yet. Add one for each fluid loop: transmission cooler, oil cooler, fuel feed and return…</Text>
        )}
        {circuits.data && circuits.data.length > 0 && <BuildCircuitsTable circuits={circuits.data} />}
      </section>

      <section className={styles.section} aria-labelledby="photos-title">
        <Text as="h2" id="photos-title" size={500} weight="semibold">
          Photos
        </Text>
        <PhotoGallery buildId={buildId} />
      </section>

      {editing && <BuildFormDialog build={build.data} onClose={() => setEditing(false)} />}
      {creatingCircuit && <CreateCircuitDialog buildId={buildId} onClose={() => setCreatingCircuit(false)} />}
    </article>
  );
}
