import type { IndexHtmlTransformContext, IndexHtmlTransformHook } from 'vite';
import { describe, expect, it } from 'vitest';
import { firstPaintPlugin } from './first-paint-plugin';

const CSS = '@font-face{font-family:"Source Sans 3";font-display:swap}body{margin:0}';
const HTML = [
  '<html><head><title>Swapwright</title>',
  '<script type="module" crossorigin src="/assets/index-a1.js"></script>',
  '<link rel="stylesheet" crossorigin href="/assets/index-b2.css">',
  '</head><body><div id="root">shell</div></body></html>',
].join('\n');

function transform(html: string, files: Record<string, string>): string {
  const bundle = Object.fromEntries(
    Object.entries(files).map(([fileName, source]) => [fileName, { type: 'asset', fileName, source }]),
  ) as unknown as IndexHtmlTransformContext['bundle'];
  const hook = firstPaintPlugin().transformIndexHtml as { handler: IndexHtmlTransformHook };
  return hook.handler.call({} as never, html, { path: '/index.html', filename: 'index.html', bundle }) as string;
}

describe('the first-paint build step for index.html', () => {
  it('inlines the entry stylesheet so no request blocks the first paint, and keeps the scripts as they are', () => {
    const html = transform(HTML, { 'assets/index-b2.css': CSS, 'assets/index-a1.js': '' });
    expect(html).not.toContain('rel="stylesheet"');
    expect(html).toContain(`<style>${CSS}</style>`);
    expect(html).toContain('<script type="module" crossorigin src="/assets/index-a1.js"></script>');
  });

  it('preloads the two Source Sans 3 woff2 files the first screen uses, and no other font file', () => {
    const html = transform(HTML, {
      'assets/index-b2.css': CSS,
      'assets/source-sans-3-latin-400-normal-DQi5PRDE.woff2': '',
      'assets/source-sans-3-latin-400-normal-RR2C27NP.woff': '',
      'assets/source-sans-3-latin-600-normal-DeckBYAU.woff2': '',
    });
    const preloads = html.match(/<link rel="preload"[^>]*>/g) ?? [];
    expect(preloads).toEqual([
      '<link rel="preload" href="/assets/source-sans-3-latin-400-normal-DQi5PRDE.woff2" as="font" type="font/woff2" crossorigin>',
      '<link rel="preload" href="/assets/source-sans-3-latin-600-normal-DeckBYAU.woff2" as="font" type="font/woff2" crossorigin>',
    ]);
  });

  it('leaves a stylesheet it cannot find in the bundle linked, and cannot be closed early by the CSS text', () => {
    expect(transform(HTML, {})).toContain('<link rel="stylesheet" crossorigin href="/assets/index-b2.css">');
    const html = transform(HTML, { 'assets/index-b2.css': 'a::after{content:"</style><script>"}' });
    expect(html).not.toContain('</style><script>');
  });
});
