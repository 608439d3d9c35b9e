import { Flex, Grid, Progress, Steps, Typography } from 'antd';
import { statusHints, statusLabels } from '../project-labels';
import { projectStatuses, type ProjectStatus } from '../types';

export type ProjectStageStepsProps = { status: ProjectStatus };

export function ProjectStageSteps({ status }: ProjectStageStepsProps) {
  const current = projectStatuses.indexOf(status);
  // A phone gets the stage in three lines instead of nine stacked steps (antd's md is 768 px).
  const narrow = Grid.useBreakpoint().md !== true;
  if (narrow) {
    const next = projectStatuses[current + 1];
    return (
      <Flex vertical gap={4} aria-label="Project stage" role="group">
        <Typography.Text strong>
          Stage {current + 1} of {projectStatuses.length}: {statusLabels[status]}
        </Typography.Text>
        <Progress percent={Math.round(((current + 1) / projectStatuses.length) * 100)} steps={projectStatuses.length} showInfo={false} size="small" aria-hidden />
        <Typography.Text type="secondary">{statusHints[status]}</Typography.Text>
        {next && <Typography.Text type="secondary">Next: {statusLabels[next]}</Typography.Text>}
      </Flex>
    );
  }
  return (
    <Steps
      size="small"
      current={current}
      status={status === 'done' ? 'finish' : 'process'}
      aria-label="Project stage"
      titlePlacement="vertical"
      items={projectStatuses.map((s, i) => ({
        title: statusLabels[s],
        content: i === current ? statusHints[s] : undefined,
      }))}
      responsive
    />
  );
}
