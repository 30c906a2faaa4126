import { Text, makeStyles, tokens } from '@fluentui/react-components';
import { mate, type ConnectionSpec } from '@linesmith/catalog';
import { useState } from 'react';
import { ConnectionEndPicker } from './ConnectionEndPicker';
import { MateResultView } from './MateResultView';

const useStyles = makeStyles({
  root: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalM },
  ends: { display: 'flex', flexWrap: 'wrap', gap: tokens.spacingHorizontalL },
});

/**
 * Two connection ends in, the mating verdict out. Runs the catalog's `mate` in the browser: it is
 * the same code the server's rules engine uses, so no round trip is needed.
 */
export function JointCheckerSection() {
  const styles = useStyles();
  const [endA, setEndA] = useState<ConnectionSpec>({ family: 'flare37', size: '-6', gender: 'male' });
  const [endB, setEndB] = useState<ConnectionSpec>({ family: 'flare37', size: '-6', gender: 'female' });
  return (
    <div className={styles.root}>
      <Text as="p">
        Pick the two ends that would meet: a port and a fitting, or two fittings. The check compares thread, seat and
        gender from the thread tables.
      </Text>
      <div className={styles.ends}>
        <ConnectionEndPicker legend="End A" value={endA} onChange={setEndA} />
        <ConnectionEndPicker legend="End B" value={endB} onChange={setEndB} />
      </div>
      <MateResultView result={mate(endA, endB)} />
    </div>
  );
}
