import { App, Button, Popconfirm, type ButtonProps } from 'antd';
import { useNavigate } from 'react-router-dom';
import { toWorkOrder } from '@/config/paths';
import { getErrorMessage } from '@/lib/api-error';
import { useStartOwnBuild } from '../api/start-own-build';
import type { Quote } from '../types';

export interface StartOwnBuildButtonProps {
  quote: Pick<Quote, 'id' | 'projectId' | 'label' | 'latestRevision'>;
  size?: ButtonProps['size'];
}

/**
 * A quote of the member's own truck has no customer to approve it or pay a deposit: this takes the working revision as
 * the budget of the build and opens its work order, after saying so, then goes to the work order.
 */
export function StartOwnBuildButton({ quote, size }: StartOwnBuildButtonProps) {
  const start = useStartOwnBuild(quote.projectId);
  const { message } = App.useApp();
  const navigate = useNavigate();
  return (
    <Popconfirm
      title={`Start your build from ${quote.label}?`}
      description={`Revision ${quote.latestRevision} is frozen as the budget of your build, and the work order opens: a step for each labor line, with torques, cautions and checks to record. No e-mail, no deposit.`}
      okText="Start my build"
      cancelText="Not yet"
      onConfirm={() =>
        start.mutate(quote.id, {
          onSuccess: (started) => {
            void message.success(`Your build has started: the work order of ${started.quote.label} is open`);
            navigate(toWorkOrder(started.workOrderId));
          },
          onError: (error) => void message.error(getErrorMessage(error)),
        })
      }
    >
      <Button type="primary" size={size} loading={start.isPending}>
        Start my build
      </Button>
    </Popconfirm>
  );
}
