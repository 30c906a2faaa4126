import {
  Badge,
  Button,
  MessageBar,
  MessageBarActions,
  MessageBarBody,
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
import { ArrowClockwiseRegular } from '@fluentui/react-icons';
import { formatDateTime } from '../../users/utils/format-date-time';
import { useOutbox } from '../hooks/useOutbox';

const useStyles = makeStyles({
  page: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalM },
  header: { display: 'flex', alignItems: 'center', justifyContent: 'space-between' },
});

/** Admin › Outbox: every e-mail Linesmith sent (invites, resets, orders) and whether it left. */
export function OutboxPage() {
  const styles = useStyles();
  const { data, isPending, isError, error, refetch, isFetching } = useOutbox();
  return (
    <section className={styles.page} aria-labelledby="outbox-title">
      <div className={styles.header}>
        <Text as="h1" id="outbox-title" size={700} weight="semibold">
          Outbox
        </Text>
        <Button icon={<ArrowClockwiseRegular />} disabled={isFetching} onClick={() => void refetch()}>
          Refresh
        </Button>
      </div>
      {isPending && <Spinner label="Loading the outbox…" />}
      {isError && (
        <MessageBar intent="error" role="alert">
          <MessageBarBody>The outbox could not be loaded: {error.message}</MessageBarBody>
          <MessageBarActions>
            <Button onClick={() => void refetch()}>Try again</Button>
          </MessageBarActions>
        </MessageBar>
      )}
      {data && data.length === 0 && <Text as="p">No e-mail sent yet.</Text>}
      {data && data.length > 0 && (
        <Table size="small" aria-label="Outbox">
          <TableHeader>
            <TableRow>
              <TableHeaderCell>When</TableHeaderCell>
              <TableHeaderCell>To</TableHeaderCell>
              <TableHeaderCell>Subject</TableHeaderCell>
              <TableHeaderCell>Attachments</TableHeaderCell>
              <TableHeaderCell>Status</TableHeaderCell>
            </TableRow>
          </TableHeader>
          <TableBody>
            {data.map((entry, index) => (
              <TableRow key={entry.id ?? `${entry.createdAt}-${index}`}>
                <TableCell>{formatDateTime(entry.createdAt)}</TableCell>
                <TableCell>{entry.to}</TableCell>
                <TableCell>{entry.subject}</TableCell>
                <TableCell>{entry.attachments.length > 0 ? entry.attachments.join(', ') : '—'}</TableCell>
                <TableCell>
                  {entry.status === 'sent' ? (
                    <Badge appearance="tint" color="success">
                      Sent
                    </Badge>
                  ) : (
                    <>
                      <Badge appearance="tint" color="danger">
                        Failed
                      </Badge>{' '}
                      {entry.error}
                    </>
                  )}
                </TableCell>
              </TableRow>
            ))}
          </TableBody>
        </Table>
      )}
    </section>
  );
}
