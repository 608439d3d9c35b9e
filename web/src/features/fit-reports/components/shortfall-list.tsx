import { renderFindingText, renderRemedyText, renderText, textParts, type Finding, type PartRemedy, type PlacementRemedy, type Remedy } from '@swapwright/shared';
import { Button, Empty, Flex, Space, Tag, Typography } from 'antd';
import { useUnits } from '@/hooks/use-units';
import { formatFigure, formatMargin, formatRequirement } from '../lib/figures';
import { describeRequirement, matchResult } from '../lib/labels';
import { categoryLabels, describePlacementRemedy, partNouns, selectionKeyFor, type PartInfo } from '../lib/remedies';
import { compareWorstFirst, groupLabels } from '../lib/status';
import { CheckStatusTag } from '@/components/check-status-tag';

export type ShortfallListProps = {
  /** Close and blocked checks (any order: the list puts the worst first). */
  shortfalls: readonly Finding[];
  /** Names of the parts the remedies may point at, by id. */
  parts?: Record<string, PartInfo>;
  /** Picks a part into the project's fit selections; absent for people who cannot change them. */
  onUsePart?: (remedy: PartRemedy, partId: string) => void;
  /** Moves the preview placement by a placement remedy. */
  onTryPlacement?: (remedy: PlacementRemedy) => void;
  /** Ids already chosen for the project (their buttons read "In use"). */
  chosenIds?: readonly string[];
  busyPartId?: string | null;
};

function PartRemedyView({ remedy, parts, onUsePart, chosenIds, busyPartId }: { remedy: PartRemedy } & Omit<ShortfallListProps, 'shortfalls' | 'onTryPlacement'>) {
  const noun = partNouns[remedy.category] ?? 'part';
  const selectable = Boolean(selectionKeyFor[remedy.category]) && Boolean(onUsePart);
  const units = useUnits();
  return (
    <div>
      <Typography.Text strong>{categoryLabels[remedy.category] ?? remedy.category}</Typography.Text>
      {remedy.note && <Typography.Text type="secondary">: {renderRemedyText(remedy, units.system)}</Typography.Text>}
      {remedy.partIds.length === 0 ? (
        <Typography.Paragraph type="secondary" style={{ margin: 0, fontSize: 13 }}>
          No catalog part matches yet. Add one to the catalog: {Object.entries(remedy.requires).map(([k, v]) => describeRequirement(k, v, units)).join(', ')}.
        </Typography.Paragraph>
      ) : (
        <ul className="fit-remedy-parts" style={{ margin: '4px 0 0', paddingLeft: 18 }}>
          {remedy.partIds.map((id) => {
            const name = parts?.[id]?.name ?? id;
            const inUse = chosenIds?.includes(id);
            return (
              <li key={id} style={{ marginBottom: 4 }}>
                <Flex gap={8} align="center" wrap>
                  <span>{name}</span>
                  {selectable &&
                    (inUse ? (
                      <Tag>In use</Tag>
                    ) : (
                      <Button
                        size="small"
                        className="fit-control"
                        aria-label={`Use this ${noun}: ${name}`}
                        loading={busyPartId === id}
                        onClick={() => onUsePart?.(remedy, id)}
                      >
                        Use this {noun}
                      </Button>
                    ))}
                </Flex>
              </li>
            );
          })}
        </ul>
      )}
    </div>
  );
}

function RemedyView({ remedy, ...rest }: { remedy: Remedy } & Omit<ShortfallListProps, 'shortfalls'>) {
  const units = useUnits();
  if (remedy.kind === 'part') return <PartRemedyView remedy={remedy} {...rest} />;
  if (remedy.kind === 'placement')
    return (
      <Flex gap={8} align="center" wrap>
        <Typography.Text strong>Move: {describePlacementRemedy(remedy, units)}</Typography.Text>
        {remedy.note && <Typography.Text type="secondary">{renderRemedyText(remedy, units.system)}</Typography.Text>}
        {rest.onTryPlacement && (
          <Button size="small" className="fit-control" onClick={() => rest.onTryPlacement?.(remedy)}>
            Preview this move
          </Button>
        )}
      </Flex>
    );
  return (
    <div>
      <Typography.Text strong>Fabricate: {renderText(textParts(remedy.operation), units.system)}</Typography.Text>{' '}
      <Tag>{remedy.laborHours.toLocaleString('en-US', { maximumFractionDigits: 1 })} h labor</Tag>
      {remedy.note && (
        <Typography.Paragraph type="secondary" style={{ margin: 0, fontSize: 13 }}>
          {renderRemedyText(remedy, units.system)}
        </Typography.Paragraph>
      )}
    </div>
  );
}

/** Every close or blocked check, worst first, with its figures in the person's units and its remedies. */
export function ShortfallList({ shortfalls, ...rest }: ShortfallListProps) {
  const units = useUnits();
  const ordered = [...shortfalls].sort(compareWorstFirst);
  if (ordered.length === 0)
    return <Empty image={Empty.PRESENTED_IMAGE_SIMPLE} description="No shortfalls: every check with enough input clears." data-testid="no-shortfalls" />;
  return (
    <ol className="fit-shortfalls" aria-label="Shortfalls, worst first" style={{ listStyle: 'none', margin: 0, padding: 0 }}>
      {ordered.map((f, index) => (
        <li
          key={f.checkId}
          data-testid={`shortfall-${f.checkId}`}
          data-status={f.status}
          style={{ padding: '12px 0', borderBottom: '1px solid #e6e7e1' }}
        >
          <Flex gap={12} align="baseline" wrap justify="space-between">
            <Space size={10} align="baseline" wrap>
              <Typography.Text type="secondary" style={{ fontVariantNumeric: 'tabular-nums' }}>
                {index + 1}.
              </Typography.Text>
              <CheckStatusTag status={f.status} />
              <Typography.Text strong style={{ fontSize: 16 }}>
                {f.title}
              </Typography.Text>
              <Typography.Text type="secondary">{groupLabels[f.group]}</Typography.Text>
            </Space>
            {f.limit === 'match' ? (
              <Typography.Text strong data-testid="shortfall-measured">
                {matchResult(f)}
              </Typography.Text>
            ) : (
              <Space size={16} wrap>
                {/* No found figure (a pump that cannot reach the pressure at all): only what is needed, never a made-up zero. */}
                {f.measured !== null && (
                  <span>
                    <Typography.Text type="secondary">Found </Typography.Text>
                    <Typography.Text strong data-testid="shortfall-measured">
                      {formatFigure(f.measured, f.unit, units)}
                    </Typography.Text>
                  </span>
                )}
                <span>
                  <Typography.Text type="secondary">Needs </Typography.Text>
                  <Typography.Text>{formatRequirement(f, units)}</Typography.Text>
                </span>
                {f.margin !== null && (
                  <span>
                    <Typography.Text type="secondary">Margin </Typography.Text>
                    <Typography.Text type={f.status === 'fails' ? 'danger' : undefined} data-testid="shortfall-margin">
                      {formatMargin(f, units)}
                    </Typography.Text>
                  </span>
                )}
              </Space>
            )}
          </Flex>
          <Typography.Paragraph style={{ margin: '4px 0 0' }}>{renderFindingText(f, units.system)}</Typography.Paragraph>
          {f.remedies.length > 0 && (
            <div className="fit-remedies" style={{ marginTop: 8, paddingLeft: 12, borderLeft: '3px solid #e6e7e1' }}>
              <Typography.Text type="secondary" style={{ fontSize: 12, textTransform: 'uppercase', letterSpacing: '0.06em' }}>
                Ways out
              </Typography.Text>
              <Flex vertical gap={8} style={{ marginTop: 4 }}>
                {f.remedies.map((r, i) => (
                  <RemedyView key={i} remedy={r} {...rest} />
                ))}
              </Flex>
            </div>
          )}
        </li>
      ))}
    </ol>
  );
}
