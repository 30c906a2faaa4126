import {
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
import { useState } from 'react';
import { formatDateTime } from '../../users/utils/format-date-time';
import { useRevisions } from '../hooks/useRevisions';
import { RevisionView } from './RevisionView';

export interface RevisionsTabProps {
  circuitId: string;
}

const useStyles = makeStyles({ root: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalM } });

/** Saved versions of the circuit, newest first; one can be opened read-only. */
export function RevisionsTab({ circuitId }: RevisionsTabProps) {
  const styles = useStyles();
  const revisions = useRevisions(circuitId);
  const [open, setOpen] = useState<number | null>(null);

  if (revisions.isPending) return <Spinner label="Loading revisions…" />;
  if (revisions.isError) {
    return (
      <MessageBar intent="error" role="alert">
        <MessageBarBody>The revisions could not be loaded: {revisions.error.message}</MessageBarBody>
        <MessageBarActions>
          <Button onClick={() => void revisions.refetch()}>Try again</Button>
        </MessageBarActions>
      </MessageBar>
    );
  }
  if (revisions.data.length === 0) {
    return <Text as="p">No saved versions yet. A version is saved from the sketch and when the circuit is submitted for review.</Text>;
  }
  const sorted = [...revisions.data].sort((a, b) => b.number - a.number);
  return (
    <div className={styles.root}>
      <Table size="small" aria-label="Revisions">
        <TableHeader>
          <TableRow>
            <TableHeaderCell style={{ width: '90px' }}>Revision</TableHeaderCell>
            <TableHeaderCell>Message</TableHeaderCell>
            <TableHeaderCell>Author</TableHeaderCell>
            <TableHeaderCell>Saved</TableHeaderCell>
            <TableHeaderCell style={{ width: '110px' }}>
              <span style={{ position: 'absolute', left: '-10000px' }}>Actions</span>
            </TableHeaderCell>
          </TableRow>
        </TableHeader>
        <TableBody>
          {sorted.map((revision) => (
            <TableRow key={revision.id} aria-selected={open === revision.number}>
              <TableCell>{revision.number}</TableCell>
              <TableCell>{revision.message || '—'}</TableCell>
              <TableCell>{revision.author?.displayName || '—'}</TableCell>
              <TableCell>{formatDateTime(revision.createdAt)}</TableCell>
              <TableCell>
                <Button
                  size="small"
                  appearance={open === revision.number ? 'primary' : 'secondary'}
                  aria-label={`Open revision ${revision.number}`}
                  onClick={() => setOpen(revision.number)}
                >
                  Open
                </Button>
              </TableCell>
            </TableRow>
          ))}
        </TableBody>
      </Table>
      {open !== null && <RevisionView key={open} circuitId={circuitId} number={open} />}
    </div>
  );
}
