import { Card, Flex, Typography } from 'antd';
import { Link } from 'react-router-dom';

export type AvailableNow = { label: string; to: string; description: string };

export type ComingNextProps = {
  /** What this place will hold, in a sentence or two. */
  coming: string;
  /** What the person can already do instead, with links. */
  now: readonly AvailableNow[];
  testId?: string;
};

/** A place whose own work has not arrived yet: says what is coming and links to what already works. */
export function ComingNext({ coming, now, testId }: ComingNextProps) {
  return (
    <Card data-testid={testId}>
      <Typography.Title level={4} style={{ marginTop: 0 }}>
        Coming next
      </Typography.Title>
      <Typography.Paragraph type="secondary">{coming}</Typography.Paragraph>
      <Typography.Title level={5}>You can already</Typography.Title>
      <Flex vertical gap={12} component="ul" style={{ listStyle: 'none', padding: 0, margin: 0 }}>
        {now.map((n) => (
          <li key={n.to}>
            <Link to={n.to} style={{ fontWeight: 600 }}>
              {n.label}
            </Link>
            <Typography.Text type="secondary" style={{ display: 'block' }}>
              {n.description}
            </Typography.Text>
          </li>
        ))}
      </Flex>
    </Card>
  );
}
