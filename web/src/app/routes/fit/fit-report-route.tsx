import { FitPrintHeader } from './fit-print-header';
import { ProjectFitPage } from './project-fit-page';

/** The fit page, with the shop's header for the printed report above it. */
export function FitReportRoute() {
  return (
    <>
      <FitPrintHeader />
      <ProjectFitPage />
    </>
  );
}
