import { App, Button, Modal, Typography, type ButtonProps } from 'antd';
import { useQuery } from '@tanstack/react-query';
import { useState } from 'react';
import { Link, useNavigate } from 'react-router-dom';
import { toWorkOrder } from '@/config/paths';
import { getErrorMessage } from '@/lib/api-error';
import { useFitReports } from '@/features/fit-reports/api/get-fit-reports';
import { measurementSheetQueryOptions } from '@/features/measurements/api/get-measurement-sheet';
import { projectPartsPlansQueryOptions } from '@/features/parts-plans/api/get-project-parts-plans';
import { useStartOwnBuild } from '../api/start-own-build';
import { ownBuildOpenItems, type OwnBuildOpenItem } from '../own-build-open-items';
import type { Quote } from '../types';

export interface StartOwnBuildButtonProps {
  quote: Pick<Quote, 'id' | 'projectId' | 'label' | 'latestRevision' | 'revision'>;
  size?: ButtonProps['size'];
}

/** What is still open on the budget, read once the confirmation opens: the newest fit report, the plan, the sheet. */
function useOpenItems(quote: StartOwnBuildButtonProps['quote'], enabled: boolean): { items: OwnBuildOpenItem[]; checking: boolean } {
  const reports = useFitReports(quote.projectId, { enabled });
  const plans = useQuery({ ...projectPartsPlansQueryOptions(quote.projectId), enabled: enabled && quote.revision.partsPlanId !== null });
  // a project without a chassis has no sheet (the API answers an error): that fact is then left out
  const sheet = useQuery({ ...measurementSheetQueryOptions(quote.projectId), enabled, retry: false });
  const planId = quote.revision.partsPlanId;
  const items = ownBuildOpenItems({
    quote,
    fitReport: reports.data ? (reports.data.items[0] ?? null) : undefined,
    partsPlan: planId === null ? null : plans.data?.find((plan) => plan.id === planId),
    sheet: sheet.data,
  });
  const checking = reports.isPending || (planId !== null && plans.isPending) || sheet.isPending;
  return { items, checking: enabled && checking };
}

/**
 * A quote of the member's own truck has no customer to approve it or pay a deposit: this takes the working revision as
 * the budget of the build and opens its work order, after saying so and listing what is still open on the budget (each
 * with a link to where it is fixed), then goes to the work order. It is their truck: they may start anyway.
 */
export function StartOwnBuildButton({ quote, size }: StartOwnBuildButtonProps) {
  const start = useStartOwnBuild(quote.projectId);
  const { message } = App.useApp();
  const navigate = useNavigate();
  const [open, setOpen] = useState(false);
  const { items, checking } = useOpenItems(quote, open);
  const anyOpen = items.some((item) => item.open);
  const confirm = () =>
    start.mutate(quote.id, {
      onSuccess: (started) => {
        setOpen(false);
        void message.success(`Your build has started: the work order of ${started.quote.label} is open`);
        navigate(toWorkOrder(started.workOrderId));
      },
      onError: (error) => void message.error(getErrorMessage(error)),
    });
  return (
    <>
      <Button type="primary" size={size} loading={start.isPending} onClick={() => setOpen(true)}>
        Start my build
      </Button>
      <Modal
        open={open}
        title={`Start your build from ${quote.label}?`}
        okText={anyOpen ? 'Start anyway' : 'Start my build'}
        cancelText="Not yet"
        okButtonProps={{ disabled: checking, loading: start.isPending }}
        onOk={confirm}
        onCancel={() => setOpen(false)}
        destroyOnHidden
      >
        <Typography.Paragraph>
          Revision {quote.latestRevision} is frozen as the budget of your build, and the work order opens: a step for each labor line, with torques,
          cautions and checks to record. No e-mail, no deposit.
        </Typography.Paragraph>
        {checking ? (
          <Typography.Paragraph type="secondary">Checking what is still open on the budget…</Typography.Paragraph>
        ) : items.length > 0 ? (
          <div data-testid="own-build-open-items">
            <Typography.Paragraph strong style={{ marginBottom: 4 }}>
              {anyOpen ? 'Still open on this budget:' : 'Before you start:'}
            </Typography.Paragraph>
            <ul style={{ paddingInlineStart: 20, margin: 0 }}>
              {items.map((item) => (
                <li key={item.key} style={{ marginBottom: 4 }}>
                  {item.sentence}{' '}
                  <Link to={item.link.to} onClick={() => setOpen(false)}>
                    {item.link.label}
                  </Link>
                </li>
              ))}
            </ul>
          </div>
        ) : (
          <Typography.Paragraph type="secondary">Nothing is left open on this budget.</Typography.Paragraph>
        )}
      </Modal>
    </>
  );
}
