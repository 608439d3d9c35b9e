import { Tag, Tooltip } from 'antd';
import { statusColors, statusHints, statusLabels } from '../project-labels';
import type { ProjectStatus } from '../types';

export type ProjectStatusTagProps = { status: ProjectStatus };

export function ProjectStatusTag({ status }: ProjectStatusTagProps) {
  const c = statusColors[status];
  return (
    <Tooltip title={statusHints[status]}>
      <Tag
        variant="filled"
        style={{ background: c.bg, color: c.fg, fontWeight: 600, marginInlineEnd: 0 }}
        data-testid={`status-${status}`}
      >
        {statusLabels[status]}
      </Tag>
    </Tooltip>
  );
}
