import { useParams } from 'react-router-dom';
import { Logo } from '@/components/logo';
import { useSignedInUser } from '@/features/auth/api/get-current-user';
import { useProject } from '@/features/projects/api/get-project';
import { formatDate } from '@/lib/dates';
import '@/features/fit-reports/components/fit-print.css';

/** The head of a printed fit report: the shop, the project, its customer and vehicle. Shown on paper only. */
export function FitPrintHeader() {
  const { projectId = '' } = useParams();
  const user = useSignedInUser();
  const project = useProject(projectId).data;
  return (
    <header className="fit-print-header" data-testid="fit-print-header">
      <div className="fit-print-header__shop">
        <Logo size={22} />
        <strong>{user.shop.name}</strong>
      </div>
      <h1 className="fit-print-header__title">Fit report{project ? `: ${project.title}` : ''}</h1>
      <dl className="fit-print-header__facts">
        <div>
          <dt>Customer</dt>
          <dd>{project?.customer?.name ?? '—'}</dd>
        </div>
        <div>
          <dt>Vehicle</dt>
          <dd>{project?.vehicleDescription || '—'}</dd>
        </div>
        <div>
          <dt>Printed</dt>
          <dd>
            {formatDate(new Date().toISOString())} by {user.name}
          </dd>
        </div>
      </dl>
    </header>
  );
}
