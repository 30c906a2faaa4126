import { Badge, makeStyles, tokens } from '@fluentui/react-components';
import { ErrorCircleRegular, InfoRegular, WarningRegular } from '@fluentui/react-icons';
import type { FlagCounts } from '../utils/flag-counts';

export interface FlagCountBadgesProps {
  counts: FlagCounts;
}

const useStyles = makeStyles({ root: { display: 'inline-flex', flexWrap: 'wrap', gap: tokens.spacingHorizontalXS } });

const plural = (n: number, one: string, many: string) => `${n} ${n === 1 ? one : many}`;

/** Blockers, cautions and notes with icon and words, so severity never rests on colour alone. */
export function FlagCountBadges({ counts }: FlagCountBadgesProps) {
  const styles = useStyles();
  if (counts.blocker + counts.caution + counts.note === 0) {
    return <Badge appearance="outline" color="success">No flags</Badge>;
  }
  return (
    <span className={styles.root}>
      {counts.blocker > 0 && (
        <Badge appearance="tint" color="danger" icon={<ErrorCircleRegular />}>
          {plural(counts.blocker, 'blocker', 'blockers')}
        </Badge>
      )}
      {counts.caution > 0 && (
        <Badge appearance="tint" color="warning" icon={<WarningRegular />}>
          {plural(counts.caution, 'caution', 'cautions')}
        </Badge>
      )}
      {counts.note > 0 && (
        <Badge appearance="tint" color="informative" icon={<InfoRegular />}>
          {plural(counts.note, 'note', 'notes')}
        </Badge>
      )}
    </span>
  );
}
