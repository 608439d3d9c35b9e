import { Flex } from 'antd';
import type { ReactNode } from 'react';
import { Link } from 'react-router-dom';
import { toProjectDetail } from '@/config/paths';
import { CompactList } from '@/components/compact-list';
import { EmptyState, QueryState } from '@/components/query-state';
import { formatDate } from '@/lib/table';
import { useProjects } from '../api/get-projects';
import type { ProjectStatus } from '../types';
import { ProjectStatusTag } from './project-status-tag';

export type ProjectsPanelProps = {
  label: string;
  status?: ProjectStatus;
  limit?: number;
  emptyText: string;
  emptyAction?: ReactNode;
  showCustomer?: boolean;
  /** Where the full list lives, shown when there are more than `limit`. */
  moreTo?: string;
  /** A second link per project (e.g. straight to its measurement sheet). */
  rowLink?: { label: string; to: (projectId: string) => string };
};

/** A short list of projects for a home page panel. */
export function ProjectsPanel({ label, status, limit = 6, emptyText, emptyAction, showCustomer = true, moreTo, rowLink }: ProjectsPanelProps) {
  const query = useProjects({ page: 1, pageSize: limit, status, sort: 'updatedAt', order: 'desc' });
  return (
    <QueryState
      query={query}
      loadingRows={3}
      isEmpty={(p) => p.items.length === 0}
      empty={<EmptyState description={emptyText} action={emptyAction} />}
    >
      {(page) => (
        <>
          <CompactList
            label={label}
            items={page.items.map((p) => ({
              key: p.id,
              title: <Link to={toProjectDetail(p.id)}>{p.title}</Link>,
              description: [showCustomer ? p.customer?.name : null, p.vehicleDescription, `changed ${formatDate(p.updatedAt)}`]
                .filter(Boolean)
                .join(' · '),
              extra: rowLink ? (
                <Flex vertical align="flex-end" gap={4}>
                  <ProjectStatusTag status={p.status} />
                  <Link to={rowLink.to(p.id)} aria-label={`${rowLink.label}: ${p.title}`}>
                    {rowLink.label}
                  </Link>
                </Flex>
              ) : (
                <ProjectStatusTag status={p.status} />
              ),
            }))}
          />
          {moreTo && page.total > page.items.length && (
            <Link to={moreTo} style={{ display: 'inline-block', marginTop: 8 }}>
              See all {page.total}
            </Link>
          )}
        </>
      )}
    </QueryState>
  );
}
