import { Steps } from 'antd';
import { statusHints, statusLabels } from '../project-labels';
import { projectStatuses, type ProjectStatus } from '../types';

export type ProjectStageStepsProps = { status: ProjectStatus };

export function ProjectStageSteps({ status }: ProjectStageStepsProps) {
  const current = projectStatuses.indexOf(status);
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
