import { useCatalogItem } from '@/features/catalog/api/get-catalog-item';
import { useFitReport } from '@/features/fit-reports/api/get-fit-report';
import { useFitReports } from '@/features/fit-reports/api/get-fit-reports';
import type { ProjectPartNames } from '@/features/projects/components/project-details';
import type { Project } from '@/features/projects/types';

/**
 * Names for the project's chassis, engine and transmission. Staff read them from the catalog;
 * customers cannot (the catalog answers 403), so they get the names stored with the latest fit report.
 */
export function useProjectPartNames(project: Project | undefined, canReadCatalog: boolean): ProjectPartNames {
  const staff = canReadCatalog && Boolean(project);
  const chassis = useCatalogItem('chassis', staff ? project?.chassisModelId : null);
  const engine = useCatalogItem('engines', staff ? project?.engineProfileId : null);
  const transmission = useCatalogItem('transmissions', staff ? project?.transmissionId : null);

  const reports = useFitReports(project?.id ?? '', { enabled: !canReadCatalog && Boolean(project) });
  const latest = useFitReport(!canReadCatalog ? reports.data?.items[0]?.id : undefined);
  const spec = latest.data?.inputs.spec;

  if (canReadCatalog) return { chassis: chassis.data?.name, engine: engine.data?.name, transmission: transmission.data?.name };
  // a chosen part the latest report does not name shows as chosen by the shop
  return { chassis: spec?.chassis?.name, engine: spec?.engine?.name, transmission: spec?.transmission?.name };
}
