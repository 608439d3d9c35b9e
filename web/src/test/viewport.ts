import { vi } from 'vitest';

/** A MediaQueryList that answers `matches` and ignores listeners (jsdom has no media queries). */
export function staticMediaQueryList(query: string, matches: boolean): MediaQueryList {
  return {
    matches,
    media: query,
    onchange: null,
    addListener: () => undefined,
    removeListener: () => undefined,
    addEventListener: () => undefined,
    removeEventListener: () => undefined,
    dispatchEvent: () => false,
  };
}

/** Answers media queries as a window `width` px wide would (min-width and max-width only), until the test ends. */
export function setWindowWidth(width: number): void {
  vi.spyOn(window, 'matchMedia').mockImplementation((query: string) => {
    const min = /min-width:\s*(\d+)px/.exec(query);
    const max = /max-width:\s*(\d+)px/.exec(query);
    return staticMediaQueryList(query, (!min || width >= Number(min[1])) && (!max || width <= Number(max[1])));
  });
}
