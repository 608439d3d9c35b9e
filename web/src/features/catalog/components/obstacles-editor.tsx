import { Button, Card, Flex, Input, Select } from 'antd';
import { obstacleKinds } from '../lib/catalog-kinds';
import { OutlineEditor, type OutlinePoint } from './outline-editor';

export type ObstacleValue = { id: string; name: string; kind: string; outline: OutlinePoint[] };

export type ObstaclesEditorProps = { value?: ObstacleValue[]; onChange?: (v: ObstacleValue[]) => void };

function slug(text: string): string {
  return text.toLowerCase().replace(/[^a-z0-9]+/g, '-').replace(/^-|-$/g, '').slice(0, 40) || 'obstacle';
}

/** The chassis obstacles, each a named closed outline in the side view. */
export function ObstaclesEditor({ value = [], onChange }: ObstaclesEditorProps) {
  const set = (i: number, patch: Partial<ObstacleValue>) => onChange?.(value.map((o, j) => (j === i ? { ...o, ...patch } : o)));
  const add = () => {
    const n = value.length + 1;
    onChange?.([...value, { id: `obstacle-${n}`, name: `Obstacle ${n}`, kind: 'crossmember', outline: [] }]);
  };
  return (
    <Flex vertical gap={12} data-testid="obstacles-editor">
      {value.map((o, i) => (
        <Card key={i} size="small" title={o.name || `Obstacle ${i + 1}`} extra={<Button size="small" danger type="text" onClick={() => onChange?.(value.filter((_, j) => j !== i))} aria-label={`Remove obstacle ${o.name}`}>Remove</Button>}>
          <Flex gap={8} style={{ marginBottom: 8 }} wrap>
            <Input
              aria-label={`Obstacle ${i + 1} name`}
              value={o.name}
              style={{ flex: '1 1 200px' }}
              onChange={(e) => set(i, { name: e.target.value, id: o.id.startsWith('obstacle-') ? slug(e.target.value) : o.id })}
            />
            <Select aria-label={`Obstacle ${i + 1} kind`} value={o.kind} options={obstacleKinds} style={{ width: 200 }} onChange={(kind: string) => set(i, { kind })} />
          </Flex>
          <OutlineEditor axes={['x', 'z']} closed label={`${o.name || `Obstacle ${i + 1}`} outline`} value={o.outline} onChange={(outline) => set(i, { outline })} />
        </Card>
      ))}
      <Button onClick={add}>Add obstacle</Button>
    </Flex>
  );
}

export const obstaclesRule = {
  validator: async (_: unknown, value: ObstacleValue[] | undefined) => {
    for (const o of value ?? []) {
      if (!o.name.trim()) throw new Error('Every obstacle needs a name.');
      if (o.outline.length < 3) throw new Error(`${o.name} needs at least 3 points to make a closed outline.`);
    }
  },
};
