import { Button, Field, ProgressBar, makeStyles, tokens } from '@fluentui/react-components';
import { DismissRegular } from '@fluentui/react-icons';
import type { PhotoUploadItem } from '../hooks/usePhotoUploads';

export interface UploadProgressListProps {
  items: readonly PhotoUploadItem[];
  onDismiss(key: string): void;
}

const useStyles = makeStyles({
  list: { listStyleType: 'none', margin: 0, padding: 0, display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalS },
  item: { display: 'flex', alignItems: 'flex-end', gap: tokens.spacingHorizontalS },
  field: { flexGrow: 1 },
});

/** One progress bar per file, with the reason when a file was refused or failed. */
export function UploadProgressList({ items, onDismiss }: UploadProgressListProps) {
  const styles = useStyles();
  if (items.length === 0) return null;
  return (
    <ul className={styles.list} aria-label="Uploads">
      {items.map((item) => {
        const failed = item.status === 'rejected' || item.status === 'failed';
        const state = failed ? 'error' : item.status === 'done' ? 'success' : 'none';
        const message =
          item.message ?? (item.status === 'done' ? 'Uploaded' : `Uploading… ${Math.round(item.progress * 100)} %`);
        return (
          <li key={item.key} className={styles.item}>
            <Field className={styles.field} label={item.fileName} validationState={state} validationMessage={message}>
              <ProgressBar value={failed ? 1 : item.progress} max={1} color={failed ? 'error' : item.status === 'done' ? 'success' : 'brand'} />
            </Field>
            {item.status !== 'uploading' && (
              <Button
                size="small"
                appearance="subtle"
                icon={<DismissRegular />}
                aria-label={`Dismiss ${item.fileName}`}
                onClick={() => onDismiss(item.key)}
              />
            )}
          </li>
        );
      })}
    </ul>
  );
}
