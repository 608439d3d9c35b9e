import { Alert, Button, Flex, Typography } from 'antd';
import type { ReactNode } from 'react';
import { notifySuccess } from '@/lib/notifier';
import { useCopySampleCatalog } from '../api/copy-sample-catalog';

export type SampleCatalogOfferProps = {
  /** Only the owner starts the shop's catalog from the sample; others are told whom to ask. */
  canStart: boolean;
  title?: string;
  /** What else the person can do (a link to add their own). */
  extra?: ReactNode;
};

/** An empty catalog's way in: one press copies Swapwright's invented sample engines, chassis and parts into the shop. */
export function SampleCatalogOffer({ canStart, title = 'Your catalog is empty', extra }: SampleCatalogOfferProps) {
  const copy = useCopySampleCatalog({
    onSuccess: (result) =>
      notifySuccess({ title: result.added > 0 ? 'Sample catalog added' : 'Nothing to add', description: result.message }),
  });
  return (
    <Alert
      type="info"
      showIcon
      data-testid="sample-catalog-offer"
      title={title}
      description={
        <Flex vertical gap={8} align="start">
          <Typography.Text>
            The fit check picks engines, chassis and parts from your shop&rsquo;s catalog.{' '}
            {canStart
              ? 'Start from Swapwright’s sample catalog (invented engines, chassis, pans and parts with realistic figures), then change or add your own.'
              : 'Ask the shop owner to start it from Swapwright’s sample catalog, or add your own entries.'}
          </Typography.Text>
          {canStart && (
            <Button type="primary" loading={copy.isPending} onClick={() => copy.mutate()}>
              Start from the sample catalog
            </Button>
          )}
          {copy.data && <Typography.Text type="secondary">{copy.data.message}</Typography.Text>}
          {extra}
        </Flex>
      }
    />
  );
}
