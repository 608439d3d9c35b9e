import { Flex, Image, Typography } from 'antd';
import { useState, type ReactNode } from 'react';

/** The thumbnail size of every photo strip, in CSS pixels. */
export const PHOTO_THUMB = 88;

/** How wide a tile grows to give a refusal's sentence room to read (within the strip's width on a phone). */
const WIDE_TILE = 'min(100%, 280px)';

export type PhotoTileProps = {
  children: ReactNode;
  footer: ReactNode;
  testId: string;
  /** The footer gets room for a sentence (an upload's refusal), the thumbnail stays its size. */
  wide?: boolean;
};

/** A square thumbnail with what belongs under it (who and when, progress, actions). */
export function PhotoTile({ children, footer, testId, wide = false }: PhotoTileProps) {
  return (
    <Flex vertical gap={4} style={{ width: wide ? WIDE_TILE : PHOTO_THUMB }} data-testid={testId}>
      <div style={{ width: PHOTO_THUMB, height: PHOTO_THUMB, borderRadius: 6, overflow: 'hidden', background: '#f0f0f0' }}>{children}</div>
      {footer}
    </Flex>
  );
}

export type PhotoThumbProps = { url: string | null; isError: boolean; alt: string };

/** A stored photo's thumbnail once its file is fetched (tap for the viewer), or a word while it loads or if it cannot. */
export function PhotoThumb({ url, isError, alt }: PhotoThumbProps) {
  if (url) return <Image src={url} alt={alt} width={PHOTO_THUMB} height={PHOTO_THUMB} style={{ objectFit: 'cover' }} />;
  return (
    <Flex align="center" justify="center" style={{ height: '100%' }}>
      <Typography.Text type="secondary" style={{ fontSize: 12 }}>
        {isError ? 'Not available' : 'Loading…'}
      </Typography.Text>
    </Flex>
  );
}

export type UploadPreviewProps = { url: string; alt: string; faded: boolean };

/**
 * A photo on its way up, drawn by the browser from the file itself; a file the browser cannot draw (a HEIC photo in
 * most desktop browsers) shows a word instead of a broken image.
 */
export function UploadPreview({ url, alt, faded }: UploadPreviewProps) {
  const [broken, setBroken] = useState(false);
  if (broken) {
    return (
      <Flex align="center" justify="center" style={{ height: '100%' }}>
        <Typography.Text type="secondary" style={{ fontSize: 12 }}>
          No preview
        </Typography.Text>
      </Flex>
    );
  }
  return <Image src={url} alt={alt} width={PHOTO_THUMB} height={PHOTO_THUMB} style={{ objectFit: 'cover', opacity: faded ? 0.6 : 1 }} onError={() => setBroken(true)} />;
}
