import { screen, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { renderWithApp } from '@/test/render';
import { setWindowWidth } from '@/test/viewport';
import { ProjectStageSteps } from '../project-stage-steps';

describe('ProjectStageSteps', () => {
  it('on a phone says the stage, what it means and what comes next in a few lines', () => {
    setWindowWidth(390);
    renderWithApp(<ProjectStageSteps status="measured" />);
    const stage = screen.getByRole('group', { name: 'Project stage' });
    expect(within(stage).getByText('Stage 2 of 9: Measured')).toBeInTheDocument();
    expect(within(stage).getByText('Measurement sheet signed off; ready for a fit check')).toBeInTheDocument();
    expect(within(stage).getByText('Next: Fit checked')).toBeInTheDocument();
  });

  it('on a wide screen shows every stage as a step', () => {
    setWindowWidth(1440);
    renderWithApp(<ProjectStageSteps status="measured" />);
    const stage = screen.getByLabelText('Project stage');
    for (const label of ['Intake', 'Measured', 'Fit checked', 'Parts planned', 'Quote sent', 'Approved', 'Deposit paid', 'In the bay']) {
      expect(within(stage).getByText(label)).toBeInTheDocument();
    }
    expect(within(stage).queryByText(/Stage 2 of 9/)).toBeNull();
  });
});
