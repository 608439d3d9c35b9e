import { Alert, Button, Card, Flex, Popconfirm, Progress, Segmented, Typography } from 'antd';
import { formatDateTime } from '@/lib/dates';
import type { SheetCounts, SheetFilter } from '../lib/sheet-state';
import type { MeasurementEvent, MeasurementPoint } from '../types';

export type SheetOverviewProps = {
  counts: SheetCounts;
  filter: SheetFilter;
  onFilter: (filter: SheetFilter) => void;
  /** Labels of the required points still without a reading. */
  missingLabels: string[];
  signedOffAt: string | null;
  signOff: MeasurementEvent | null;
  canSignOff: boolean;
  signingOff: boolean;
  onSignOff: () => void;
};

/** A filter's name over its count: four fit side by side on a phone. */
function FilterLabel({ name, count }: { name: string; count: number }) {
  return (
    <div style={{ lineHeight: 1.25, padding: '4px 0' }}>
      <div>{name}</div>
      <div style={{ fontWeight: 600 }}>{count}</div>
    </div>
  );
}

/** How far the sheet is: what is measured, what is missing (listed), what is flagged; the filter; sign-off. */
export function SheetOverview({ counts, filter, onFilter, missingLabels, signedOffAt, signOff, canSignOff, signingOff, onSignOff }: SheetOverviewProps) {
  const percent = counts.required === 0 ? 100 : Math.round((counts.requiredMeasured / counts.required) * 100);
  return (
    <Card size="small" data-testid="sheet-overview">
      <Flex vertical gap={10}>
        <Flex justify="space-between" align="baseline" wrap gap={8}>
          <Typography.Text strong style={{ fontSize: 16 }} data-testid="sheet-counts">
            {counts.requiredMeasured} of {counts.required} required points measured
          </Typography.Text>
          <Typography.Text type="secondary">
            {counts.missing} missing · {counts.flagged} far from catalog
          </Typography.Text>
        </Flex>
        <Progress percent={percent} showInfo={false} status={counts.missing === 0 ? 'success' : 'active'} aria-label="Required points measured" />
        {counts.missing > 0 && (
          // One point a line, each with an empty box, so the fabricator can work down it at the truck.
          <div data-testid="missing-list">
            <Typography.Text type="secondary" style={{ fontSize: 13 }} id="missing-list-title">
              Still to measure ({missingLabels.length}):
            </Typography.Text>
            <ul className="missing-points" aria-labelledby="missing-list-title">
              {missingLabels.map((label) => (
                <li key={label}>
                  <span className="missing-points-box" aria-hidden />
                  <span>{label}</span>
                </li>
              ))}
            </ul>
          </div>
        )}
        <Segmented<SheetFilter>
          block
          size="large"
          value={filter}
          onChange={onFilter}
          aria-label="Show points"
          options={[
            { value: 'missing', label: <FilterLabel name="Missing" count={counts.missing} /> },
            { value: 'flagged', label: <FilterLabel name="Flagged" count={counts.flagged} /> },
            { value: 'measured', label: <FilterLabel name="Done" count={counts.measured} /> },
            { value: 'all', label: <FilterLabel name="All" count={counts.total} /> },
          ]}
        />
        {signedOffAt ? (
          <Alert
            type="success"
            showIcon
            data-testid="signed-off"
            title={`Signed off${signOff ? ` by ${signOff.by}` : ''}, ${formatDateTime(signedOffAt)}`}
            description="A change from now on asks for a reason; both are kept in the history."
          />
        ) : (
          canSignOff && (
            <Popconfirm
              title="Sign the sheet off?"
              description="You confirm every required point was measured on the truck. Later changes will need a reason."
              okText="Sign off"
              onConfirm={onSignOff}
              disabled={counts.missing > 0}
            >
              <Button type="primary" size="large" block disabled={counts.missing > 0} loading={signingOff} style={{ height: 48 }}>
                {counts.missing > 0 ? `Sign off (measure ${counts.missing} more first)` : 'Sign off the sheet'}
              </Button>
            </Popconfirm>
          )
        )}
      </Flex>
    </Card>
  );
}

export function missingLabelsOf(points: MeasurementPoint[], missing: string[]): string[] {
  const ids = new Set(missing);
  return points.filter((p) => ids.has(p.id)).map((p) => p.label);
}
