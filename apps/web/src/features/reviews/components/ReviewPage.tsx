import { Spinner, Text, makeStyles, tokens } from '@fluentui/react-components';
import { useParams } from 'react-router-dom';
import { useSession } from '../../auth/hooks/useSession';
import { PageTrail } from '../../builds/components/PageTrail';
import { CircuitStatusBadge } from '../../circuits/components/CircuitStatusBadge';
import { useCircuit } from '../../circuits/hooks/useCircuit';
import { needsSafetyNote } from '../../circuits/utils/fluid-labels';
import { SafetyNote } from '../../shell/components/SafetyNote';
import { ReviewPanel } from './ReviewPanel';

const useStyles = makeStyles({
  page: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalM },
  header: { display: 'flex', flexWrap: 'wrap', alignItems: 'center', gap: tokens.spacingHorizontalL },
});

/** The reviewer's page for one submitted circuit (`/reviews/:circuitId`). */
export function ReviewPage() {
  const styles = useStyles();
  const { circuitId = '' } = useParams();
  const circuit = useCircuit(circuitId);
  const { hasRole } = useSession();
  const name = circuit.data?.name ?? 'Circuit';
  return (
    <article className={styles.page} aria-labelledby="review-title">
      <PageTrail steps={[{ label: 'Reviews', to: '/reviews' }, { label: name }]} />
      <div className={styles.header}>
        <Text as="h1" id="review-title" size={700} weight="semibold">
          Review: {name}
        </Text>
        {circuit.data && <CircuitStatusBadge status={circuit.data.status} />}
        {circuit.isPending && <Spinner size="tiny" />}
      </div>
      {circuit.data && needsSafetyNote(circuit.data.fluid) && <SafetyNote />}
      <ReviewPanel circuitId={circuitId} canDecide={hasRole('reviewer', 'admin')} />
    </article>
  );
}
