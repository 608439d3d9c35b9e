import type { Finding, FitSpec, FitWindow, Placement } from '@swapwright/shared';
import { Alert, Card } from 'antd';
import { SideView } from './side-view';

export type SideViewCardProps = {
  spec: FitSpec;
  findings: readonly Finding[];
  window: FitWindow | null;
  /** The proposed placement drawn over the view (default: the window's best at this tilt). */
  proposed?: Placement | null;
};

/** The side view with the fit window over it, and what to do when no crank height clears. */
export function SideViewCard({ spec, findings, window, proposed }: SideViewCardProps) {
  return (
    <Card title="Side view" className="fit-side-card">
      <SideView spec={spec} findings={findings} window={window} proposed={proposed ?? window?.best?.placement ?? null} />
      {window && !window.columns.some((c) => c.feasible) && (
        <Alert
          style={{ marginTop: 8 }}
          type="info"
          showIcon
          data-testid="no-fit-window"
          title="No clear window near this placement"
          description={`At ${window.tiltDeg.toFixed(1)}° tilt no crank height clears every clearance check within the setbacks searched. Work through the shortfalls (a different pan, hood or firewall work) and run again.`}
        />
      )}
    </Card>
  );
}
