import { formatQuantity, marginWords, type Finding, type PlacementProposal, type ProposalBound } from '@swapwright/shared';
import { Typography } from 'antd';
import { useUnits } from '@/hooks/use-units';

export type ProposalBoundsProps = {
  proposal: PlacementProposal;
  /** The report's findings, for the checks' names. */
  findings: readonly Finding[];
};

/** The proposed placement and the checks that limit it, tightest first. */
export function ProposalBounds({ proposal, findings }: ProposalBoundsProps) {
  const units = useUnits();
  const { placement, boundedBy, allPass } = proposal;
  // clearances the report could not check (no oil pan chosen, say) did not weigh in: the sentence says so
  const unchecked = findings.filter((f) => f.group === 'envelope' && f.status === 'unknown').length;
  const title = (checkId: string) => findings.find((f) => f.checkId === checkId)?.title ?? checkId;
  // "0.25 in to spare", "short by 0.12 in", "2.0° over": shared's one wording of a signed margin.
  const room = (b: ProposalBound) =>
    marginWords(b.margin, (size) => (b.unit === 'deg' ? formatQuantity(size, 'angle', units.system) : units.formatLength(size)), b.limit);
  return (
    <div data-testid="placement-proposal">
      <Typography.Text strong>Best placement found</Typography.Text>
      <Typography.Paragraph style={{ margin: '2px 0 4px', fontSize: 13 }}>
        {units.formatLength(placement.setbackMm)} back, {units.formatLength(placement.heightMm)} up, tilted {placement.tiltDeg.toFixed(1)}°
        {allPass
          ? unchecked > 0
            ? `, with every clearance that could be checked and the U-joint angles passing; ${unchecked === 1 ? '1 clearance needs' : `${unchecked} clearances need`} input first (see the checks below).`
            : ', with every clearance and the U-joint angles passing.'
          : ': the most room found, but not every check passes there.'}
      </Typography.Paragraph>
      {boundedBy.length > 0 && (
        <>
          <Typography.Text type="secondary" style={{ fontSize: 12 }}>
            Limited by
          </Typography.Text>
          <ul style={{ margin: 0, paddingLeft: 18, fontSize: 13 }}>
            {boundedBy.map((b) => (
              <li key={b.checkId}>
                {title(b.checkId)}: {room(b)}
              </li>
            ))}
          </ul>
        </>
      )}
    </div>
  );
}
