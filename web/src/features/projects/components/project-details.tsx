import { Alert, Card, Descriptions, Skeleton, Typography } from 'antd';
import { Link } from 'react-router-dom';
import { useUnits } from '@/hooks/use-units';
import { formatMoneyCents, formatPower } from '@/lib/units';
import { useLabels } from '../project-labels';
import type { Project } from '../types';

export type ProjectGoalsCardProps = { project: Project; currency?: string };

export function ProjectGoalsCard({ project, currency = 'USD' }: ProjectGoalsCardProps) {
  const { system } = useUnits();
  const g = project.goals;
  return (
    <Card title="Goals" data-testid="project-goals">
      <Descriptions
        column={{ xs: 1, sm: 2 }}
        items={[
          { key: 'use', label: 'Main use', children: g?.use ? useLabels[g.use] : '—' },
          { key: 'power', label: 'Target power', children: formatPower(g?.targetPowerKw, system) },
          {
            key: 'rev',
            label: 'Planned rev limit',
            children: g?.revLimitRpm ? `${g.revLimitRpm.toLocaleString('en-US')} rpm` : '—',
          },
          { key: 'budget', label: 'Budget', children: formatMoneyCents(g?.budgetCents, currency) },
        ]}
      />
    </Card>
  );
}

export type ProjectPartNames = { chassis?: string; engine?: string; transmission?: string };

/**
 * Why a chosen part has no name to show yet: `loading` while it is fetched, `gone` when the record was removed from
 * the catalog, `unavailable` when it could not be read just now. The card never shows the record's id instead.
 */
export type PartNameState = 'loading' | 'gone' | 'unavailable';
export type ProjectPartNameStates = Partial<Record<keyof ProjectPartNames, PartNameState>>;

export type ProjectSelectionsCardProps = {
  project: Project;
  /** Catalog names for the chosen ids, when the viewer may read them. */
  names?: ProjectPartNames;
  /** For a chosen part without a name: why (loading, gone from the catalog, not readable now). */
  nameStates?: ProjectPartNameStates;
  /** Shown for a chosen part whose name is not known (e.g. the viewer cannot read the catalog). */
  unnamedLabel?: string;
  /** Where the parts are chosen or the fit report is read. */
  fitPath?: string;
  fitLinkLabel?: string;
};

export function ProjectSelectionsCard({ project, names = {}, nameStates = {}, unnamedLabel, fitPath, fitLinkLabel = 'Choose parts on the fit page' }: ProjectSelectionsCardProps) {
  const slot = (id: string | null, name: string | undefined, state: PartNameState | undefined, what: string) => {
    if (!id) return <Typography.Text type="secondary">No {what} chosen yet</Typography.Text>;
    if (name) return <Typography.Text>{name}</Typography.Text>;
    if (state === 'loading' || (state === undefined && !unnamedLabel)) {
      return (
        <span role="status" aria-label={`Loading the ${what}'s name`} data-testid="part-name-loading">
          <Skeleton.Input active size="small" style={{ width: 160, height: 18, minWidth: 0 }} />
        </span>
      );
    }
    if (state === 'gone') return <Typography.Text type="secondary">Not in the catalog any more</Typography.Text>;
    if (state === 'unavailable') return <Typography.Text type="secondary">The name could not be loaded; reload the page to try again</Typography.Text>;
    return <Typography.Text type="secondary">{unnamedLabel}</Typography.Text>;
  };
  return (
    <Card title="Chassis, engine and transmission" data-testid="project-selections">
      <Descriptions
        column={1}
        items={[
          { key: 'vehicle', label: 'Vehicle as described', children: project.vehicleDescription || '—' },
          { key: 'chassis', label: 'Chassis model', children: slot(project.chassisModelId, names.chassis, nameStates.chassis, 'chassis model') },
          { key: 'engine', label: 'Engine', children: slot(project.engineProfileId, names.engine, nameStates.engine, 'engine') },
          { key: 'trans', label: 'Transmission', children: slot(project.transmissionId, names.transmission, nameStates.transmission, 'transmission') },
        ]}
      />
      {fitPath && (
        <Typography.Paragraph style={{ margin: '8px 0 0' }}>
          <Link to={fitPath}>{fitLinkLabel}</Link>
        </Typography.Paragraph>
      )}
    </Card>
  );
}

export type ProjectPlacementCardProps = { project: Project };

export function ProjectPlacementCard({ project }: ProjectPlacementCardProps) {
  const { formatLength } = useUnits();
  const p = project.placement;
  return (
    <Card title="Engine placement" data-testid="project-placement">
      {p ? (
        <Descriptions
          column={{ xs: 1, sm: 3 }}
          items={[
            { key: 'setback', label: 'Setback from front axle', children: formatLength(p.setbackMm) },
            { key: 'height', label: 'Crank centerline height', children: formatLength(p.heightMm) },
            { key: 'tilt', label: 'Tilt', children: `${p.tiltDeg.toFixed(1)}°` },
          ]}
        />
      ) : (
        <Typography.Paragraph type="secondary" style={{ margin: 0 }}>
          No placement saved yet: each fit check places the engine itself, at the best placement it finds in the engine bay. Save one on the fit check page to keep it.
        </Typography.Paragraph>
      )}
      <Alert
        style={{ marginTop: 12 }}
        type="warning"
        showIcon
        title="Planning figures only"
        description="Confirm clearances on the vehicle before cutting or welding. Support the vehicle on rated stands and the engine on a rated hoist whenever anyone works under or around it."
      />
    </Card>
  );
}
