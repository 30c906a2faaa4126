import { Text, makeStyles, tokens } from '@fluentui/react-components';
import type { ChangeGroup } from '../utils/change-descriptions';

export interface ChangeListProps {
  groups: readonly ChangeGroup[];
}

const useStyles = makeStyles({
  root: { display: 'grid', gridTemplateColumns: 'repeat(auto-fit, minmax(320px, 1fr))', gap: tokens.spacingHorizontalXL },
  list: { margin: 0, paddingLeft: tokens.spacingHorizontalXL },
});

/** What changed between two revisions, by kind of item. */
export function ChangeList({ groups }: ChangeListProps) {
  const styles = useStyles();
  if (groups.length === 0) return <Text as="p">No differences: the two sketches are the same.</Text>;
  return (
    <div className={styles.root}>
      {groups.map((group) => (
        <section key={group.title} aria-label={group.title}>
          <Text as="h3" size={400} weight="semibold">
            {group.title}
          </Text>
          <ul className={styles.list}>
            {group.items.map((item, i) => (
              <li key={`${i}-${item}`}>{item}</li>
            ))}
          </ul>
        </section>
      ))}
    </div>
  );
}
