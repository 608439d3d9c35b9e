import type { Page } from 'playwright-core';

/**
 * A small real JPEG, drawn and encoded by the browser itself (320 × 240): a plate of `shade`, with a dark bar across
 * it when `bar` is set.
 */
export async function makeJpeg(page: Page, { shade = '#9aa3ab', bar = true }: { shade?: string; bar?: boolean } = {}): Promise<Buffer> {
  const base64 = await page.evaluate(
    ([fill, withBar]) => {
      const canvas = document.createElement('canvas');
      canvas.width = 320;
      canvas.height = 240;
      const ctx = canvas.getContext('2d')!;
      ctx.fillStyle = fill;
      ctx.fillRect(0, 0, 320, 240);
      if (withBar) {
        ctx.fillStyle = '#30363d';
        ctx.fillRect(40, 110, 240, 40);
      }
      return canvas.toDataURL('image/jpeg', 0.8).split(',')[1];
    },
    [shade, bar] as const,
  );
  return Buffer.from(base64, 'base64');
}
