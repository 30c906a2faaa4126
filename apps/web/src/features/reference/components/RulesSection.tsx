import {
  Spinner,
  Table,
  TableBody,
  TableCell,
  TableHeader,
  TableHeaderCell,
  TableRow,
  Text,
  makeStyles,
  tokens,
} from '@fluentui/react-components';
import { useRuleSummaries } from '../hooks/useRuleSummaries';
import { QueryErrorBar } from './QueryErrorBar';
import { SeverityLabel } from './SeverityLabel';

// Fixed-layout table: the short columns get what they need, the description the rest.
const useStyles = makeStyles({
  codeColumn: { width: '13em' },
  severityColumn: { width: '8em' },
  ruleColumn: { width: '18em' },
  root: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalM },
  code: { fontFamily: tokens.fontFamilyMonospace, whiteSpace: 'nowrap' },
});

/** The rules engine's registry, so a shop can read what each flag on a circuit checks. */
export function RulesSection() {
  const styles = useStyles();
  const rules = useRuleSummaries();
  if (rules.isPending) return <Spinner size="small" label="Loading the rules…" />;
  if (rules.isError) return <QueryErrorBar what="The rules" error={rules.error} onRetry={() => void rules.refetch()} />;
  if (rules.data.length === 0) return <Text as="p">The server lists no rules.</Text>;
  return (
    <div className={styles.root}>
      <Text as="p">
        A blocker must be fixed before a circuit can be approved; a caution must be acknowledged by the reviewer with a
        note; a note is for information.
      </Text>
      <Table size="small" aria-label="Rules">
        <TableHeader>
          <TableRow>
            <TableHeaderCell className={styles.codeColumn}>Code</TableHeaderCell>
            <TableHeaderCell className={styles.severityColumn}>Severity</TableHeaderCell>
            <TableHeaderCell className={styles.ruleColumn}>Rule</TableHeaderCell>
            <TableHeaderCell>What it checks</TableHeaderCell>
          </TableRow>
        </TableHeader>
        <TableBody>
          {rules.data.map((rule) => (
            <TableRow key={rule.code}>
              <TableCell className={styles.code}>{rule.code}</TableCell>
              <TableCell>
                <SeverityLabel level={rule.severity} />
              </TableCell>
              <TableCell>{rule.title}</TableCell>
              <TableCell>{rule.description}</TableCell>
            </TableRow>
          ))}
        </TableBody>
      </Table>
    </div>
  );
}
