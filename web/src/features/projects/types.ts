import type { PagedQueryOf, RequestBodyOf, ResponseOf, Schemas } from '@/lib/api-types';

export { PROJECT_STATUSES as projectStatuses, SWAP_USES as projectUses, type ProjectStatus, type SwapUse as ProjectUse } from '@swapwright/shared';

export type Project = Schemas['ProjectResponseDto'];
/** The use, target power, rev limit and budget the swap is planned for. */
export type ProjectGoals = Schemas['ProjectGoalsResponseDto'];
/** Where the engine sits (null until someone sets it; the fit check then proposes one). */
export type ProjectPlacement = Schemas['ProjectPlacementResponseDto'];
export type ProjectPage = ResponseOf<'/api/projects', 'get'>;
export type ProjectListQuery = PagedQueryOf<'/api/projects'>;
export type ProjectSort = NonNullable<ProjectListQuery['sort']>;
export type CreateProjectInput = RequestBodyOf<'/api/projects', 'post'>;
export type UpdateProjectInput = RequestBodyOf<'/api/projects/{id}', 'patch'>;

/** The columns the table lets a person sort by (all of them the API sorts by). */
export const projectSortFields: readonly ProjectSort[] = ['title', 'status', 'createdAt', 'updatedAt'];
