import type { UseQueryResult } from '@tanstack/react-query';
import { useCatalogItem } from '@/features/catalog/api/get-catalog-item';
import { useFitReport } from '@/features/fit-reports/api/get-fit-report';
import { useFitReports } from '@/features/fit-reports/api/get-fit-reports';
import type { PartNameState, ProjectPartNames, ProjectPartNameStates } from '@/features/projects/components/project-details';
import type { Project } from '@/features/projects/types';
import { getStatus } from '@/lib/api-error';

/** Why a catalog read has no name yet: still loading, the record is gone (404), or it could not be read. */
function catalogState(query: UseQueryResult<unknown>): PartNameState | undefined {
  if (query.isError) return getStatus(query.error) === 404 ? 'gone' : 'unavailable';
  if (query.isLoading) return 'loading';
  return undefined;
}

/**
 * Names for the project's chassis, engine and transmission, and for each one still without a name, why. Staff read
 * them from the catalog; customers cannot (the catalog answers 403), so they get the names stored with the latest
 * fit report.
 */
export function useProjectPartNames(project: Project | undefined, canReadCatalog: boolean): { names: ProjectPartNames; states: ProjectPartNameStates } {
  const staff = canReadCatalog && Boolean(project);
  const chassis = useCatalogItem('chassis', staff ? project?.chassisModelId : null);
  const engine = useCatalogItem('engines', staff ? project?.engineProfileId : null);
  const transmission = useCatalogItem('transmissions', staff ? project?.transmissionId : null);

  const reports = useFitReports(project?.id ?? '', { enabled: !canReadCatalog && Boolean(project) });
  const latestId = !canReadCatalog ? reports.data?.items[0]?.id : undefined;
  const latest = useFitReport(latestId);
  const spec = latest.data?.inputs.spec;

  if (canReadCatalog) {
    return {
      names: { chassis: chassis.data?.name, engine: engine.data?.name, transmission: transmission.data?.name },
      states: { chassis: catalogState(chassis), engine: catalogState(engine), transmission: catalogState(transmission) },
    };
  }
  // a chosen part the latest report does not name shows as chosen by the shop, once the report is read
  const reading = reports.isLoading || (Boolean(latestId) && latest.isLoading) ? 'loading' : undefined;
  return {
    names: { chassis: spec?.chassis?.name, engine: spec?.engine?.name, transmission: spec?.transmission?.name },
    states: { chassis: reading, engine: reading, transmission: reading },
  };
}
