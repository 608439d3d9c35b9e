import { Grid } from 'antd';

/** A drawer's width: the preferred one, or the whole screen on a phone, so the form never runs past the edge. */
export function useDrawerSize(preferredPx: number): number | string {
  const screens = Grid.useBreakpoint();
  return screens.md === false ? '100%' : preferredPx;
}
