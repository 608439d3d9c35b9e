import { Flex, Image, Typography } from 'antd';
import type { ReactNode } from 'react';

/** The thumbnail size of every photo strip, in CSS pixels. */
export const PHOTO_THUMB = 88;

export type PhotoTileProps = { children: ReactNode; footer: ReactNode; testId: string };

/** A square thumbnail with what belongs under it (who and when, progress, actions). */
export function PhotoTile({ children, footer, testId }: PhotoTileProps) {
  return (
    <Flex vertical gap={4} style={{ width: PHOTO_THUMB }} data-testid={testId}>
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
