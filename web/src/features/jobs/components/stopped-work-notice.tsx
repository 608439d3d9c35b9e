import { Alert } from 'antd';
import { Link } from 'react-router-dom';
import { useJobs } from '../api/get-jobs';

export type StoppedWorkNoticeProps = { to: string };

/** Says on the owner's home when e-mails or payment events stopped after their last attempt; nothing otherwise. */
export function StoppedWorkNotice({ to }: StoppedWorkNoticeProps) {
  const jobs = useJobs({ page: 1, pageSize: 1, state: 'dead' });
  const stopped = jobs.data?.counts.dead ?? 0;
  if (stopped === 0) return null;
  return (
    <Alert
      type="warning"
      showIcon
      style={{ marginBottom: 16 }}
      title={stopped === 1 ? 'An e-mail or payment event stopped after its last attempt.' : `${stopped} e-mails or payment events stopped after their last attempt.`}
      description={
        <>
          See what went wrong and try again under <Link to={to}>Background work</Link>.
        </>
      }
    />
  );
}
