import {
  Button,
  MessageBar,
  MessageBarActions,
  MessageBarBody,
  Spinner,
  Text,
  makeStyles,
  mergeClasses,
  tokens,
} from '@fluentui/react-components';
import { ImageAddRegular } from '@fluentui/react-icons';
import { useRef, useState, type DragEvent } from 'react';
import type { Upload } from '../api/upload-schema';
import { usePhotoUploads } from '../hooks/usePhotoUploads';
import { useUploads } from '../hooks/useUploads';
import { acceptedPhotoTypes, formatBytes, maxPhotoBytes } from '../utils/check-photo-file';
import { DeletePhotoDialog } from './DeletePhotoDialog';
import { PhotoThumbnail } from './PhotoThumbnail';
import { UploadProgressList } from './UploadProgressList';

export interface PhotoGalleryProps {
  buildId: string;
}

const useStyles = makeStyles({
  root: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalM },
  drop: {
    display: 'flex',
    alignItems: 'center',
    gap: tokens.spacingHorizontalM,
    padding: tokens.spacingVerticalL,
    border: `${tokens.strokeWidthThick} dashed ${tokens.colorNeutralStroke1}`,
    borderRadius: tokens.borderRadiusMedium,
    backgroundColor: tokens.colorNeutralBackground2,
  },
  dragging: { border: `${tokens.strokeWidthThick} dashed ${tokens.colorBrandStroke1}`, backgroundColor: tokens.colorBrandBackground2 },
  dropIcon: { fontSize: '32px', color: tokens.colorBrandForeground1, flexShrink: 0 },
  hiddenInput: { display: 'none' },
  grid: { display: 'grid', gridTemplateColumns: 'repeat(auto-fill, minmax(180px, 1fr))', gap: tokens.spacingHorizontalM },
});

const acceptAttribute = Object.keys(acceptedPhotoTypes).join(',');

/** Photos of the vehicle for sketching over: drop or pick files, watch each upload, delete with confirmation. */
export function PhotoGallery({ buildId }: PhotoGalleryProps) {
  const styles = useStyles();
  const inputRef = useRef<HTMLInputElement>(null);
  const [dragging, setDragging] = useState(false);
  const [deleting, setDeleting] = useState<Upload | null>(null);
  const uploads = useUploads(buildId);
  const { items, addFiles, dismiss } = usePhotoUploads(buildId);
  const photos = uploads.data?.filter((upload) => upload.kind === 'photo') ?? [];

  function onDrop(event: DragEvent<HTMLDivElement>) {
    event.preventDefault();
    setDragging(false);
    addFiles(Array.from(event.dataTransfer.files));
  }

  return (
    <div className={styles.root}>
      <div
        className={mergeClasses(styles.drop, dragging && styles.dragging)}
        onDragEnter={(e) => {
          e.preventDefault();
          setDragging(true);
        }}
        onDragOver={(e) => e.preventDefault()}
        onDragLeave={() => setDragging(false)}
        onDrop={onDrop}
        aria-label="Drop photos here"
      >
        <ImageAddRegular className={styles.dropIcon} aria-hidden="true" />
        <div>
          <Text block weight="semibold">
            Drop photos of the engine bay or chassis here
          </Text>
          <Text block size={200}>
            {Object.values(acceptedPhotoTypes).join(', ')} up to {formatBytes(maxPhotoBytes)} each.
          </Text>
        </div>
        <Button onClick={() => inputRef.current?.click()}>Choose photos…</Button>
        <input
          ref={inputRef}
          className={styles.hiddenInput}
          type="file"
          accept={acceptAttribute}
          multiple
          aria-label="Choose photos"
          onChange={(event) => {
            addFiles(Array.from(event.target.files ?? []));
            event.target.value = ''; // the same file can be picked again after a failure
          }}
        />
      </div>

      <UploadProgressList items={items} onDismiss={dismiss} />

      {uploads.isPending && <Spinner size="small" label="Loading photos…" />}
      {uploads.isError && (
        <MessageBar intent="error" role="alert">
          <MessageBarBody>The photos could not be loaded: {uploads.error.message}</MessageBarBody>
          <MessageBarActions>
            <Button onClick={() => void uploads.refetch()}>Try again</Button>
          </MessageBarActions>
        </MessageBar>
      )}
      {uploads.data && photos.length === 0 && (
        <Text as="p">No photos yet. A photo becomes the background a circuit is sketched on.</Text>
      )}
      {photos.length > 0 && (
        <div className={styles.grid}>
          {photos.map((upload) => (
            <PhotoThumbnail key={upload.id} upload={upload} onDelete={setDeleting} />
          ))}
        </div>
      )}

      {deleting && <DeletePhotoDialog key={deleting.id} buildId={buildId} upload={deleting} onClose={() => setDeleting(null)} />}
    </div>
  );
}
