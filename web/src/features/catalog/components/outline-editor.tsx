import { Button, Flex, Table, Typography } from 'antd';
import type { ColumnsType } from 'antd/es/table';
import { useUnits } from '@/hooks/use-units';
import { axisLabel } from '../lib/catalog-kinds';
import { LengthInput } from '@/components/length-input';

export type OutlinePoint = Record<string, number>;

export type OutlineEditorProps = {
  /** Points in millimetres. */
  value?: OutlinePoint[];
  onChange?: (points: OutlinePoint[]) => void;
  axes: readonly [string, string];
  /** Names the table and its buttons for screen readers. */
  label: string;
  closed?: boolean;
};

type Row = OutlinePoint & { key: number };

/** A point list as a table of rows, typed in the person's unit and kept in millimetres. */
export function OutlineEditor({ value = [], onChange, axes, label, closed }: OutlineEditorProps) {
  const units = useUnits();
  const [a, b] = axes;
  const rows: Row[] = value.map((p, i) => ({ ...p, key: i }));

  const setPoint = (index: number, axis: string, mm: number | null) => {
    // an emptied cell keeps its last figure until a number is typed; unreadable text is kept as NaN, which the form refuses
    if (mm === null) return;
    const next = value.map((p, i) => (i === index ? { ...p, [axis]: mm } : p));
    onChange?.(next);
  };
  const add = () => {
    const last = value[value.length - 1];
    onChange?.([...value, last ? { ...last } : { [a]: 0, [b]: 0 }]);
  };
  const remove = (index: number) => onChange?.(value.filter((_, i) => i !== index));

  const columns: ColumnsType<Row> = [
    { title: '#', key: 'n', width: 48, render: (_, r) => r.key + 1 },
    ...[a, b].map((axis) => ({
      title: `${axisLabel(axis)} (${units.unitLabel})`,
      key: axis,
      render: (_: unknown, r: Row) => (
        <LengthInput size="small" aria-label={`${label}: point ${r.key + 1} ${axisLabel(axis).toLowerCase()}`} value={r[axis]} onChange={(mm) => setPoint(r.key, axis, mm)} />
      ),
    })),
    {
      title: <span className="sr-only">Remove</span>,
      key: 'remove',
      width: 90,
      align: 'right',
      render: (_, r) => (
        <Button size="small" type="text" danger onClick={() => remove(r.key)} aria-label={`Remove point ${r.key + 1} of ${label}`}>
          Remove
        </Button>
      ),
    },
  ];

  return (
    <div data-testid="outline-editor">
      <Table<Row> size="small" rowKey="key" columns={columns} dataSource={rows} pagination={false} aria-label={label} locale={{ emptyText: 'No points yet' }} />
      <Flex justify="space-between" align="center" style={{ marginTop: 6 }}>
        <Button size="small" onClick={add} aria-label={`Add a point to ${label}`}>
          Add point
        </Button>
        <Typography.Text type="secondary" style={{ fontSize: 12 }}>
          {value.length} point{value.length === 1 ? '' : 's'}
          {closed ? ', closed outline' : ''}
        </Typography.Text>
      </Flex>
    </div>
  );
}

/** Form rule: enough points, every figure readable, no point twice, and the negative axis below zero where one is set. */
export function outlineRule(minPoints: number, label: string, negativeAxis?: string) {
  return {
    validator: async (_: unknown, value: OutlinePoint[] | undefined) => {
      const points = value ?? [];
      if (points.length < minPoints) throw new Error(`${label} needs at least ${minPoints} points.`);
      const unreadable = points.flatMap((p, i) => (Object.values(p).some((v) => typeof v !== 'number' || !Number.isFinite(v)) ? [i + 1] : []));
      if (unreadable.length > 0)
        throw new Error(`${label}: row ${unreadable.join(', ')} has a figure that is not a length (type for example 12 1/2, 12.5 in or 318 mm).`);
      for (let i = 0; i < points.length; i++)
        for (let j = i + 1; j < points.length; j++) {
          const same = Object.keys(points[i]).every((k) => Math.abs((points[i][k] as number) - (points[j][k] as number)) < 0.05);
          if (same) throw new Error(`${label}: rows ${i + 1} and ${j + 1} are the same point. Change one or remove it.`);
        }
      if (negativeAxis) {
        const rows = points.flatMap((p, i) => ((p[negativeAxis] as number) >= 0 ? [i + 1] : []));
        if (rows.length > 0) throw new Error(`${label}: ${axisLabel(negativeAxis)} must be negative (below the crank) in row ${rows.join(', ')}.`);
      }
    },
  };
}

/**
 * The API names a point by its list index from 0 ("bottomProfile.1.w must be negative"); the table numbers
 * rows from 1. Rewrites such paths as "Bottom profile row 2: w must be negative".
 */
export function translateOutlineErrors(text: string, outlines: ReadonlyArray<{ name: string; label: string }>): string {
  return text.replace(/(?:\b[A-Za-z]+\.)*?\b([A-Za-z]+)\.(\d+)\.([A-Za-z]+)\b/g, (match, list: string, index: string, axis: string) => {
    const outline = outlines.find((o) => o.name === list);
    if (!outline) return match;
    return `${outline.label} row ${Number(index) + 1}: ${axisLabel(axis)}`;
  });
}
