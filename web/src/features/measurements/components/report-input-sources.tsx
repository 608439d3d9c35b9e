import { Alert, Collapse, Empty, Flex, Tag, Typography } from 'antd';
import type { ReactNode } from 'react';
import { useUnits } from '@/hooks/use-units';
import { formatDateTime } from '@/lib/dates';
import { renderFigures } from '@/lib/units';
import { sourcesByCheck, sourceTotals } from '../lib/report-sources';
import { formatDeviation, formatReading } from '../lib/sheet-state';
import type { ChassisInput } from '../types';

export type ReportInputSourcesProps = {
  /** The stored report's chassis inputs with their sources (absent on reports stored before sheets existed). */
  inputs: ChassisInput[] | undefined;
  /** The report's checks, in its order. */
  checks: ReadonlyArray<{ checkId: string; title: string }>;
  formatLength: (mm: number) => string;
  /** A link to the project's measurement sheet. */
  sheetLink?: ReactNode;
};

function InputLine({ input, formatLength }: { input: ChassisInput; formatLength: (mm: number) => string }) {
  const { system } = useUnits();
  const fromSheet = input.source.kind === 'sheet';
  const figure = formatReading(fromSheet ? input.measuredValue : input.catalogValue, input.unit, formatLength);
  return (
    <li style={{ marginBottom: 6 }} data-testid="report-input" data-source={input.source.kind}>
      <Flex vertical gap={2}>
        <Typography.Text>
          {renderFigures(input.label, system)}: <strong>{figure}</strong>{' '}
          {input.flagged && input.deviation !== null && (
            <Tag color="red">Far from catalog ({formatDeviation(input.deviation, input.unit, formatLength)}): take a second look</Tag>
          )}
        </Typography.Text>
        <Typography.Text type="secondary" style={{ fontSize: 13 }}>
          {fromSheet
            ? `From the sheet: measured by ${input.source.measuredBy ?? 'someone no longer in the shop'}, ${formatDateTime(input.source.measuredAt)}${
                input.catalogValue !== null ? ` (catalog ${formatReading(input.catalogValue, input.unit, formatLength)})` : ''
              }`
            : 'From the catalog (not measured)'}
        </Typography.Text>
      </Flex>
    </li>
  );
}

/**
 * Check by check, which chassis figures the stored report took from the measurement sheet (who measured, when) and
 * which from the catalog; a measured figure far from the catalog's is flagged for a second look.
 */
export function ReportInputSources({ inputs, checks, formatLength, sheetLink }: ReportInputSourcesProps) {
  const { system } = useUnits();
  if (!inputs || inputs.length === 0) {
    return <Empty image={Empty.PRESENTED_IMAGE_SIMPLE} description="This report was stored without a list of its chassis inputs. Run the fit check again to see where each figure came from." />;
  }
  const groups = sourcesByCheck(inputs, checks);
  const label = (input: ChassisInput) => renderFigures(input.label, system);
  const totals = sourceTotals(inputs);
  return (
    <Flex vertical gap={12} data-testid="report-sources">
      <Typography.Text>
        {totals.fromSheet} chassis figure{totals.fromSheet === 1 ? '' : 's'} from the measurement sheet, {totals.fromCatalog} from the catalog. {sheetLink}
      </Typography.Text>
      {totals.flagged.length > 0 && (
        <Alert
          type="warning"
          showIcon
          title={`${totals.flagged.length} measured figure${totals.flagged.length === 1 ? ' is' : 's are'} far from the catalog's: take a second look`}
          description={totals.flagged
            .map((i) => `${label(i)}: ${formatReading(i.measuredValue, i.unit, formatLength)} (${formatDeviation(i.deviation ?? 0, i.unit, formatLength)})`)
            .join('; ')}
        />
      )}
      <Collapse
        size="small"
        items={groups.map((g) => ({
          key: g.checkId,
          label: (
            <Flex justify="space-between" gap={8} wrap>
              <span>{g.title}</span>
              <Flex gap={4} wrap>
                {g.fromSheet > 0 && <Tag color="blue">{g.fromSheet} from the sheet</Tag>}
                {g.fromCatalog > 0 && <Tag>{g.fromCatalog} from the catalog</Tag>}
                {g.flagged > 0 && <Tag color="red">{g.flagged} to look at</Tag>}
              </Flex>
            </Flex>
          ),
          children: (
            <ul style={{ margin: 0, paddingLeft: 18 }} aria-label={`Inputs of ${g.title}`}>
              {g.inputs.map((input) => (
                <InputLine key={input.pointId} input={input} formatLength={formatLength} />
              ))}
            </ul>
          ),
        }))}
      />
    </Flex>
  );
}
