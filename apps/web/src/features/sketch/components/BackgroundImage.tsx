import { useEffect, useState } from 'react';
import { Image as KonvaImage } from 'react-konva';
import { useUploadBlobUrl } from '../../builds/hooks/useUploadBlobUrl';

export interface BackgroundImageProps {
  uploadId: string;
  opacity: number;
  onSize?(size: { width: number; height: number }): void;
}

/** The build photo behind the sketch, at its own pixel size (sketch pixels are photo pixels). */
export function BackgroundImage({ uploadId, opacity, onSize }: BackgroundImageProps) {
  const source = useUploadBlobUrl(uploadId);
  const [image, setImage] = useState<HTMLImageElement | null>(null);
  useEffect(() => {
    if (source.status !== 'ready') return;
    const img = new window.Image();
    img.onload = () => {
      setImage(img);
      onSize?.({ width: img.naturalWidth, height: img.naturalHeight });
    };
    img.src = source.url;
    return () => {
      img.onload = null;
    };
  }, [source, onSize]);
  if (!image) return null;
  return <KonvaImage image={image} opacity={opacity} name="background" />;
}
