import { Button, Text, makeStyles, tokens } from '@fluentui/react-components';
import { EditRegular } from '@fluentui/react-icons';
import { formatDateTime } from '../../users/utils/format-date-time';
import type { Build } from '../api/build-schema';
import { BuildStatusBadge } from './BuildStatusBadge';

export interface BuildDetailsPanelProps {
  build: Build;
  onEdit(): void;
}

const useStyles = makeStyles({
  panel: {
    display: 'grid',
    gridTemplateColumns: 'repeat(auto-fit, minmax(260px, 1fr))',
    gap: tokens.spacingHorizontalXXL,
    padding: tokens.spacingVerticalM,
    border: `${tokens.strokeWidthThin} solid ${tokens.colorNeutralStroke2}`,
    borderRadius: tokens.borderRadiusMedium,
    backgroundColor: tokens.colorNeutralBackground1,
  },
  list: { display: 'grid', gridTemplateColumns: 'max-content 1fr', columnGap: tokens.spacingHorizontalM, rowGap: tokens.spacingVerticalXXS, margin: 0 },
  term: { color: tokens.colorNeutralForeground3 },
  value: { margin: 0 },
  heading: { display: 'flex', alignItems: 'center', justifyContent: 'space-between', marginBottom: tokens.spacingVerticalXS },
  notes: { whiteSpace: 'pre-wrap', margin: 0 },
});

const dash = (value: string) => (value === '' ? '—' : value);

/** Vehicle and customer of the build, with the edit button. */
export function BuildDetailsPanel({ build, onEdit }: BuildDetailsPanelProps) {
  const styles = useStyles();
  const { vehicle, customer } = build;
  return (
    <section className={styles.panel} aria-label="Vehicle and customer">
      <div>
        <div className={styles.heading}>
          <Text as="h2" size={400} weight="semibold">
            Vehicle
          </Text>
        </div>
        <dl className={styles.list}>
          <dt className={styles.term}>Year</dt>
          <dd className={styles.value}>{dash(vehicle.year)}</dd>
          <dt className={styles.term}>Make</dt>
          <dd className={styles.value}>{dash(vehicle.make)}</dd>
          <dt className={styles.term}>Model</dt>
          <dd className={styles.value}>{dash(vehicle.model)}</dd>
          <dt className={styles.term}>Engine</dt>
          <dd className={styles.value}>{dash(vehicle.engine)}</dd>
          <dt className={styles.term}>Transmission</dt>
          <dd className={styles.value}>{dash(vehicle.transmission)}</dd>
        </dl>
      </div>
      <div>
        <div className={styles.heading}>
          <Text as="h2" size={400} weight="semibold">
            Customer
          </Text>
        </div>
        <dl className={styles.list}>
          <dt className={styles.term}>Name</dt>
          <dd className={styles.value}>{dash(customer.name)}</dd>
          <dt className={styles.term}>Phone</dt>
          <dd className={styles.value}>{customer.phone ? <a href={`tel:${customer.phone}`}>{customer.phone}</a> : '—'}</dd>
          <dt className={styles.term}>E-mail</dt>
          <dd className={styles.value}>{customer.email ? <a href={`mailto:${customer.email}`}>{customer.email}</a> : '—'}</dd>
        </dl>
      </div>
      <div>
        <div className={styles.heading}>
          <Text as="h2" size={400} weight="semibold">
            Job
          </Text>
          <Button size="small" icon={<EditRegular />} onClick={onEdit}>
            Edit build
          </Button>
        </div>
        <dl className={styles.list}>
          <dt className={styles.term}>Status</dt>
          <dd className={styles.value}>
            <BuildStatusBadge status={build.status} />
          </dd>
          <dt className={styles.term}>Started</dt>
          <dd className={styles.value}>
            {build.createdBy?.displayName ? `${build.createdBy.displayName}, ` : ''}
            {formatDateTime(build.createdAt)}
          </dd>
          <dt className={styles.term}>Last changed</dt>
          <dd className={styles.value}>{formatDateTime(build.updatedAt)}</dd>
          <dt className={styles.term}>Notes</dt>
          <dd className={styles.value}>
            <p className={styles.notes}>{build.notes || '—'}</p>
          </dd>
        </dl>
      </div>
    </section>
  );
}
