import { useState } from 'react';
import { useFitReport } from '../api/get-fit-report';
import { useFitReports } from '../api/get-fit-reports';

/** The project's report history and the one report on screen: the newest, until the person opens another. */
export function useOpenReport(projectId: string) {
  const reports = useFitReports(projectId);
  const [openId, setOpenId] = useState<string | undefined>();
  const reportId = openId ?? reports.data?.items[0]?.id;
  const report = useFitReport(reportId);
  return { reports, report, reportId, openReport: setOpenId };
}
