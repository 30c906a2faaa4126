import { Text, makeStyles, tokens } from '@fluentui/react-components';
import type { CircuitDocument, LengthUnit } from '@linesmith/routing';
import { useMemo } from 'react';
import type { CircuitCheck } from '../api/check-schema';
import { useParts } from '../hooks/useParts';
import { cutListTotals } from '../utils/cut-list-totals';
import { countFlags } from '../utils/flag-counts';
import { partDescriptions } from '../utils/part-descriptions';
import { formatCutLength, formatLength } from '@linesmith/routing';
import { BomTable } from './BomTable';
import { CutListTable } from './CutListTable';
import { FlagCountBadges } from './FlagCountBadges';
import { FlagList } from './FlagList';

export interface CircuitCheckViewProps {
  check: CircuitCheck;
  document: CircuitDocument | undefined;
  lengthUnit: LengthUnit;
  /** Heading level of the sub-sections (h2 on the circuit page, h3 inside a revision). */
  headingLevel?: 'h2' | 'h3';
}

const useStyles = makeStyles({
  root: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalM },
  summary: { display: 'flex', flexWrap: 'wrap', alignItems: 'center', gap: tokens.spacingHorizontalL },
});

/** Flags, cut list and parts of one check result, shared by the cut-list tab and the revision view. */
export function CircuitCheckView({ check, document, lengthUnit, headingLevel = 'h2' }: CircuitCheckViewProps) {
  const styles = useStyles();
  const descriptions = useMemo(() => partDescriptions(check.bom), [check.bom]);
  const hoseIds = check.lines.flatMap((line) => (line.hosePartId ? [line.hosePartId] : []));
  const hoseParts = useParts(hoseIds);
  const totals = cutListTotals(check.lines);

  return (
    <div className={styles.root}>
      <div className={styles.summary}>
        <FlagCountBadges counts={countFlags(check.flags)} />
        <Text size={200}>
          {totals.lines} {totals.lines === 1 ? 'line' : 'lines'} · {formatCutLength(totals.totalCutIn, lengthUnit)} of hose cut
          {totals.cutLines < totals.lines ? ` (${totals.lines - totals.cutLines} not measured yet)` : ''} ·{' '}
          {totals.supports} supports · {formatLength(totals.sleeveIn, lengthUnit)} of sleeve
        </Text>
      </div>
      {check.flags.length > 0 && <FlagList flags={check.flags} />}

      <Text as={headingLevel} size={400} weight="semibold">
        Cut list
      </Text>
      {check.lines.length === 0 ? (
        <Text as="p">No lines drawn yet: the cut list fills in as lines are drawn on the sketch.</Text>
      ) : (
        <CutListTable
          lines={check.lines}
          document={document}
          descriptions={descriptions}
          hoseParts={hoseParts}
          lengthUnit={lengthUnit}
        />
      )}

      <Text as={headingLevel} size={400} weight="semibold">
        Parts
      </Text>
      {check.bom.rows.length === 0 ? <Text as="p">No parts yet.</Text> : <BomTable bom={check.bom} lengthUnit={lengthUnit} />}
    </div>
  );
}
