import { Button, Spinner, Text, makeStyles, tokens } from '@fluentui/react-components';
import { DeleteRegular, ImageRegular } from '@fluentui/react-icons';
import type { Upload } from '../api/upload-schema';
import { useUploadBlobUrl } from '../hooks/useUploadBlobUrl';
import { formatBytes } from '../utils/check-photo-file';

export interface PhotoThumbnailProps {
  upload: Upload;
  onDelete(upload: Upload): void;
}

const useStyles = makeStyles({
  figure: {
    margin: 0,
    display: 'flex',
    flexDirection: 'column',
    gap: tokens.spacingVerticalXXS,
    border: `${tokens.strokeWidthThin} solid ${tokens.colorNeutralStroke2}`,
    borderRadius: tokens.borderRadiusMedium,
    padding: tokens.spacingVerticalXS,
    backgroundColor: tokens.colorNeutralBackground1,
  },
  frame: {
    height: '120px',
    display: 'flex',
    alignItems: 'center',
    justifyContent: 'center',
    backgroundColor: tokens.colorNeutralBackground3,
    borderRadius: tokens.borderRadiusSmall,
    overflow: 'hidden',
  },
  image: { maxWidth: '100%', maxHeight: '100%', objectFit: 'contain' },
  placeholder: { fontSize: '32px', color: tokens.colorNeutralForeground3 },
  caption: { display: 'flex', alignItems: 'center', justifyContent: 'space-between', gap: tokens.spacingHorizontalXS },
  name: { overflow: 'hidden', textOverflow: 'ellipsis', whiteSpace: 'nowrap' },
});

/** One stored photo: its bytes come through the authorised blob fetch and are released on unmount. */
export function PhotoThumbnail({ upload, onDelete }: PhotoThumbnailProps) {
  const styles = useStyles();
  const image = useUploadBlobUrl(upload.id);
  const size = upload.widthPx && upload.heightPx ? `${upload.widthPx} × ${upload.heightPx} px · ` : '';
  return (
    <figure className={styles.figure}>
      <div className={styles.frame}>
        {image.status === 'loading' && <Spinner size="tiny" label="Loading photo…" />}
        {image.status === 'ready' && <img className={styles.image} src={image.url} alt={upload.fileName} />}
        {image.status === 'error' && <ImageRegular className={styles.placeholder} aria-label={`Preview not available: ${image.message}`} />}
      </div>
      <figcaption className={styles.caption}>
        <span>
          <Text block size={200} weight="semibold" className={styles.name} title={upload.fileName}>
            {upload.fileName}
          </Text>
          <Text block size={100}>
            {size}
            {formatBytes(upload.sizeBytes)}
          </Text>
        </span>
        <Button
          size="small"
          appearance="subtle"
          icon={<DeleteRegular />}
          aria-label={`Delete ${upload.fileName}`}
          onClick={() => onDelete(upload)}
        />
      </figcaption>
    </figure>
  );
}
