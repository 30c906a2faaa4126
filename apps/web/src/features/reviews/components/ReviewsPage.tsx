import {
  Button,
  Dropdown,
  Field,
  MessageBar,
  MessageBarActions,
  MessageBarBody,
  Option,
  Spinner,
  Text,
  makeStyles,
  tokens,
} from '@fluentui/react-components';
import { useSearchParams } from 'react-router-dom';
import {
  reviewQueueFiltersSchema,
  reviewQueueStatusLabels,
  reviewQueueStatusSchema,
  type ReviewQueueFilters,
  type ReviewQueueSort,
} from '../api/review-queue-filters';
import { useReviewQueue } from '../hooks/useReviewQueue';
import { ReviewQueueTable } from './ReviewQueueTable';

const sortLabels: Readonly<Record<ReviewQueueSort, string>> = { submittedAt: 'Longest waiting first', build: 'By build' };

const useStyles = makeStyles({
  page: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalM },
  toolbar: { display: 'flex', flexWrap: 'wrap', gap: tokens.spacingHorizontalL, alignItems: 'end' },
});

/** The review queue: submitted circuits waiting for the shop lead, oldest first by default. */
export function ReviewsPage() {
  const styles = useStyles();
  const [params, setParams] = useSearchParams();
  const filters = reviewQueueFiltersSchema.parse({ status: params.get('status') ?? undefined, sort: params.get('sort') ?? undefined });
  const queue = useReviewQueue(filters);
  const change = (next: Partial<ReviewQueueFilters>) => setParams({ ...filters, ...next }, { replace: true });

  return (
    <section className={styles.page} aria-labelledby="reviews-title">
      <Text as="h1" id="reviews-title" size={700} weight="semibold">
        Reviews
      </Text>
      <Text as="p">
        Every caution needs a note from the reviewer, and a circuit with a blocker goes back to the fabricator. Approved revisions are locked.
      </Text>
      <div className={styles.toolbar}>
        <Field label="Status">
          <Dropdown
            value={reviewQueueStatusLabels[filters.status]}
            selectedOptions={[filters.status]}
            onOptionSelect={(_, d) => {
              const status = reviewQueueStatusSchema.safeParse(d.optionValue);
              if (status.success) change({ status: status.data });
            }}
          >
            {reviewQueueStatusSchema.options.map((status) => (
              <Option key={status} value={status}>
                {reviewQueueStatusLabels[status]}
              </Option>
            ))}
          </Dropdown>
        </Field>
        <Field label="Order">
          <Dropdown
            value={sortLabels[filters.sort]}
            selectedOptions={[filters.sort]}
            onOptionSelect={(_, d) => change({ sort: d.optionValue === 'build' ? 'build' : 'submittedAt' })}
          >
            {(Object.keys(sortLabels) as ReviewQueueSort[]).map((sort) => (
              <Option key={sort} value={sort}>
                {sortLabels[sort]}
              </Option>
            ))}
          </Dropdown>
        </Field>
      </div>
      {queue.isPending && <Spinner label="Loading the review queue…" />}
      {queue.isError && (
        <MessageBar intent="error" role="alert">
          <MessageBarBody>The review queue could not be loaded: {queue.error.message}</MessageBarBody>
          <MessageBarActions>
            <Button onClick={() => void queue.refetch()}>Try again</Button>
          </MessageBarActions>
        </MessageBar>
      )}
      {queue.data && queue.data.length === 0 && (
        <Text as="p" role="status">
          {filters.status === 'in-review'
            ? 'Nothing is waiting for review. Circuits appear here when a fabricator submits them.'
            : `No ${reviewQueueStatusLabels[filters.status].toLowerCase()} circuits.`}
        </Text>
      )}
      {queue.data && queue.data.length > 0 && <ReviewQueueTable rows={queue.data} />}
    </section>
  );
}
