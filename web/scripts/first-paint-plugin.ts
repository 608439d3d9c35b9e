import type { Plugin } from 'vite';

/** Fonts the first screen uses (body text and headings), fetched as soon as the page is read. */
const PRELOADED_FONTS = [/source-sans-3-latin-400-normal-[\w-]+\.woff2$/, /source-sans-3-latin-600-normal-[\w-]+\.woff2$/];

/**
 * Makes index.html paint on its own, before any script or stylesheet arrives:
 * - the entry's stylesheet (the @font-face rules and a few global rules, about 1 KB) goes inline, so no request
 *   blocks the first paint (the content security policy allows inline style: antd writes its CSS-in-JS that way);
 * - the two Source Sans 3 woff2 files are preloaded; their @font-face rules say `font-display: swap`, so text
 *   paints at once in the fallback font and takes Source Sans 3 when it arrives.
 * Scripts are untouched here; the entry starts the app only after the shell's first frame (see src/main.tsx).
 */
export function firstPaintPlugin(): Plugin {
  return {
    name: 'swapwright-first-paint',
    apply: 'build',
    transformIndexHtml: {
      order: 'post',
      handler(html, context) {
        const bundle = context.bundle;
        if (!bundle) return html;
        const inlined = html.replace(/<link rel="stylesheet"[^>]*href="\/([^"]+\.css)"[^>]*>/g, (tag, fileName: string) => {
          const asset = bundle[fileName];
          if (!asset || asset.type !== 'asset') return tag;
          return `<style>${String(asset.source).replace(/<\/style/gi, '<\\/style')}</style>`;
        });
        const fonts = Object.keys(bundle).filter((fileName) => PRELOADED_FONTS.some((pattern) => pattern.test(fileName)));
        const preloads = fonts.map((fileName) => `<link rel="preload" href="/${fileName}" as="font" type="font/woff2" crossorigin>`).join('\n    ');
        return preloads ? inlined.replace('</title>', `</title>\n    ${preloads}`) : inlined;
      },
    },
  };
}
