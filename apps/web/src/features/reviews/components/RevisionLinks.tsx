import { Text, makeStyles, tokens } from '@fluentui/react-components';
import { Fragment } from 'react';
import { Link } from 'react-router-dom';
import { useRevisions } from '../../circuits/hooks/useRevisions';
import { comparePath, sheetPath } from '../utils/review-paths';

export interface RevisionLinksProps {
  circuitId: string;
}

const useStyles = makeStyles({
  root: { display: 'flex', flexWrap: 'wrap', gap: tokens.spacingHorizontalL, marginBottom: tokens.spacingVerticalM },
  link: { color: tokens.colorBrandForegroundLink },
});

/** Under the Revisions tab: compare revisions, and each revision's printable shop sheet. */
export function RevisionLinks({ circuitId }: RevisionLinksProps) {
  const styles = useStyles();
  const revisions = useRevisions(circuitId);
  const numbers = (revisions.data ?? []).map((r) => r.number).sort((a, b) => b - a);
  if (numbers.length === 0) return null;
  return (
    <nav className={styles.root} aria-label="Revision tools">
      <Link className={styles.link} to={comparePath(circuitId, numbers[0], 'draft')}>
        Compare revisions
      </Link>
      <Text>
        Shop sheets:{' '}
        {numbers.map((n, i) => (
          <Fragment key={n}>
            {i > 0 && ' · '}
            <Link className={styles.link} to={sheetPath(circuitId, n)}>
              revision {n}
            </Link>
          </Fragment>
        ))}
      </Text>
    </nav>
  );
}
