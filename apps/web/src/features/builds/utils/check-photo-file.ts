/** Photo types the server accepts (it sniffs the bytes too; this check only saves a wasted upload). */
export const acceptedPhotoTypes: Readonly<Record<string, string>> = {
  'image/jpeg': 'JPEG',
  'image/png': 'PNG',
  'image/webp': 'WebP',
};

export const maxPhotoBytes = 15 * 1024 * 1024;

export function formatBytes(bytes: number): string {
  if (bytes < 1024) return `${bytes} B`;
  if (bytes < 1024 * 1024) return `${(bytes / 1024).toFixed(0)} KB`;
  return `${(bytes / (1024 * 1024)).toFixed(1)} MB`;
}

/** Null when the file may be uploaded, else the reason in plain words. */
export function checkPhotoFile(file: Pick<File, 'name' | 'type' | 'size'>): string | null {
  if (!(file.type in acceptedPhotoTypes)) {
    const kinds = Object.values(acceptedPhotoTypes).join(', ');
    return `${file.name} is not a photo Linesmith can use: choose a ${kinds} image.`;
  }
  if (file.size === 0) return `${file.name} is empty.`;
  if (file.size > maxPhotoBytes) {
    return `${file.name} is ${formatBytes(file.size)}; photos can be at most ${formatBytes(maxPhotoBytes)}. Export a smaller copy and try again.`;
  }
  return null;
}
