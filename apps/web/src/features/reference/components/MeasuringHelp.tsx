import { Text, makeStyles, tokens } from '@fluentui/react-components';

const useStyles = makeStyles({
  root: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalXS },
  list: { margin: 0, paddingLeft: tokens.spacingHorizontalXL },
});

/** How to take the reading the identifier needs; shown before the first search. */
export function MeasuringHelp() {
  const styles = useStyles();
  return (
    <div className={styles.root} aria-label="How to measure">
      <Text weight="semibold">How to measure a male thread</Text>
      <ol className={styles.list}>
        <li>Clean the thread. With a caliper, measure the outside diameter across the crests (the tops of the thread), not in the grooves.</li>
        <li>On a pipe thread, measure a few threads from the end: it gets larger toward the hex.</li>
        <li>
          Find the pitch with a thread gauge: try inch leaves (threads per inch) and metric leaves (pitch in mm) until
          one sits in the thread with no light under it. Without a gauge, count the crests over one inch.
        </li>
        <li>Sight along the thread against a straight edge: if the gap opens toward the end, the thread tapers.</li>
      </ol>
      <Text size={200}>
        To identify a female port, measure a male fitting that threads into it by hand.
      </Text>
    </div>
  );
}
