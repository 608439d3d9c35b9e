import { Injectable } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import { computeFitWindow, resolveFitSettings } from '@swapwright/shared';
import type {
  AccessoryDriveSpec,
  ChassisInput,
  BellhousingAdapterSpec,
  ChassisSpec,
  EngineControllerSpec,
  EngineSpec,
  FitSettings,
  FitSpec,
  MountAdapterSpec,
  OilPanSpec,
  OilPickupSpec,
  OilPumpSpec,
  Placement,
  SerpentineBeltSpec,
  SwapGoals,
  TransmissionSpec,
} from '@swapwright/shared';
import { Repository } from 'typeorm';
import { CatalogService } from '../catalog/catalog.service';
import { chassisDefaultPlacement } from '../catalog/catalog-kinds';
import { CatalogChassis } from '../catalog/catalog-item.entity';
import { AuthUser } from '../common/tenant/auth-user';
import { Project } from '../projects/project.entity';
import { MeasurementsService } from '../measurements/measurements.service';
import { PlacementSource } from './fit-report-record.entity';
import { FitReportErrors } from './fit-reports.errors';
import { ProjectFitSelection } from './project-fit-selection.entity';

export interface BuiltFitSpec {
  spec: FitSpec;
  /** Per chassis input governed by a measurement point: its value's source (sheet or catalog) and deviation. */
  chassisInputs: ChassisInput[];
  placementSource: PlacementSource;
  notes: string[];
}

type Shop = Pick<AuthUser, 'shopId'>;

/**
 * Turns a project (engine, chassis, transmission, placement, goals), its fit selections and the shop's
 * catalog into the fit engine's input. Missing parts are left out, so the engine reports `unknown` for the
 * checks that need them; only an engine, a chassis, a placement and the goals' figures are required.
 */
@Injectable()
export class FitSpecBuilderService {
  constructor(
    private readonly catalog: CatalogService,
    private readonly measurements: MeasurementsService,
    @InjectRepository(ProjectFitSelection) private readonly selections: Repository<ProjectFitSelection>,
  ) {}

  /**
   * What to choose before the fit check can run, in words and with where: the engine and the chassis are picked under
   * "What goes in" on the fit check page; a shop whose catalog has none is pointed at the catalog and its sample.
   */
  private async choosePartsFirst(user: Shop, project: Project, noEngine: boolean, noChassis: boolean): Promise<string> {
    const what = noEngine && noChassis ? 'an engine and a chassis' : noEngine ? 'an engine' : 'a chassis';
    const gone = [
      noEngine && project.engineProfileId ? "the project's engine" : null,
      noChassis && project.chassisModelId ? "the project's chassis" : null,
    ].filter(Boolean);
    let sentence = `choose ${what} under "What goes in" on the fit check page`;
    if (gone.length > 0) sentence += ` (${gone.join(' and ')} ${gone.length === 1 ? 'is' : 'are'} no longer in the catalog)`;
    const [engines, chassis] = await Promise.all([
      noEngine ? this.catalog.hasAny('engines', user) : true,
      noChassis ? this.catalog.hasAny('chassis', user) : true,
    ]);
    if (!engines || !chassis) {
      const empty = !engines && !chassis ? 'engines or chassis' : !engines ? 'engines' : 'chassis';
      sentence += `; your catalog has no ${empty} yet: add them on the Catalog page, or start from the sample catalog`;
    }
    return sentence;
  }

  async build(user: Shop, project: Project, settingsOverrides: Partial<FitSettings> = {}): Promise<BuiltFitSpec> {
    const notes: string[] = [];
    const [engine, chassisRow, transmission] = await Promise.all([
      this.catalog.findSpec<EngineSpec>('engines', user, project.engineProfileId),
      this.catalog.findRow('chassis', user, project.chassisModelId) as Promise<CatalogChassis | null>,
      this.catalog.findSpec<TransmissionSpec>('transmissions', user, project.transmissionId),
    ]);
    if (!engine || !chassisRow) throw FitReportErrors.notReady([await this.choosePartsFirst(user, project, !engine, !chassisRow)]);
    const needed: string[] = [];
    if (project.transmissionId && !transmission) notes.push("The project's transmission is no longer in the catalog; drivetrain checks are unknown.");
    if (!project.transmissionId) notes.push('No transmission selected; drivetrain checks are unknown.');

    // The measurement sheet's values replace the catalog's where measured (see docs/fit-spec.md, "Measured chassis").
    const measured = await this.measurements.appliedFor(user, project);
    const chassis = measured?.chassis ?? (chassisRow.spec as ChassisSpec);
    const chassisInputs = measured?.inputs ?? [];
    const fromSheet = chassisInputs.filter((input) => input.source.kind === 'sheet');
    if (fromSheet.length > 0) {
      const flagged = fromSheet.filter((input) => input.flagged).length;
      notes.push(
        `${fromSheet.length} chassis input${fromSheet.length === 1 ? '' : 's'} from the measurement sheet in place of the catalog` +
          (flagged ? `; ${flagged} far from the catalog, worth a second look.` : '.'),
      );
    }
    const selection = await this.selections.findOne({ where: { projectId: project.id, shopId: user.shopId } });
    const [oilPan, oilPickup, oilPump, controller] = await Promise.all([
      this.catalog.findSpec<OilPanSpec>('oil-pans', user, selection?.oilPanId),
      this.catalog.findSpec<OilPickupSpec>('oil-pickups', user, selection?.oilPickupId),
      this.catalog.findSpec<OilPumpSpec>('oil-pumps', user, selection?.oilPumpId),
      this.catalog.findSpec<EngineControllerSpec>('controllers', user, selection?.controllerId),
    ]);

    const goals = this.goals(project, engine, selection, needed, notes);
    const partial: Omit<FitSpec, 'placement'> = {
      engine,
      ...(selection?.accessoryDriveId && { accessoryDriveId: selection.accessoryDriveId }),
      ...(selection?.mountAdapterId && { mountAdapterId: selection.mountAdapterId }),
      ...(oilPan && { oilPan }),
      ...(oilPickup && { oilPickup }),
      ...(oilPump && { oilPump }),
      ...(transmission && { transmission }),
      chassis,
      ...(controller && { controller }),
      ...(this.driveshaft(selection) && { driveshaft: this.driveshaft(selection)! }),
      ...(selection?.timingSetAdvanceDeg !== null && selection?.timingSetAdvanceDeg !== undefined && {
        timingSetAdvanceDeg: selection.timingSetAdvanceDeg,
      }),
      goals: goals ?? ({} as SwapGoals),
      candidates: await this.candidates(user, engine, selection?.accessoryDriveId ?? undefined),
    };
    const placed = this.placement(project, partial, chassisRow, settingsOverrides, needed);
    if (needed.length > 0 || !goals || !placed) throw FitReportErrors.notReady(needed);
    return { spec: { ...partial, placement: placed.placement }, placementSource: placed.source, notes, chassisInputs };
  }

  /**
   * The catalog parts the engine may offer as remedies: pans that bolt to this engine, adapters for its bell,
   * and the lengths of the stock belts as wide as the chosen accessory drive.
   */
  async candidates(user: Shop, engine: EngineSpec, accessoryDriveId?: string): Promise<NonNullable<FitSpec['candidates']>> {
    const drive = chosenAccessoryDrive(engine, accessoryDriveId);
    const [oilPans, oilPickups, oilPumps, mountAdapters, bellhousingAdapters, controllers, belts] = await Promise.all([
      this.catalog.candidateSpecs<OilPanSpec>('oil-pans', user, { railPattern: engine.panRail.pattern }),
      this.catalog.candidateSpecs<OilPickupSpec>('oil-pickups', user),
      this.catalog.candidateSpecs<OilPumpSpec>('oil-pumps', user),
      this.catalog.candidateSpecs<MountAdapterSpec>('mount-adapters', user),
      this.catalog.candidateSpecs<BellhousingAdapterSpec>('bellhousing-adapters', user, { enginePattern: engine.bellPattern }),
      this.catalog.candidateSpecs<EngineControllerSpec>('controllers', user),
      drive ? this.catalog.candidateSpecs<SerpentineBeltSpec>('belts', user, { ribs: drive.ribs }) : Promise.resolve([]),
    ]);
    const stockBeltLengthsMm = drive ? stockBeltLengthsFor(drive, belts) : [];
    return {
      oilPans,
      oilPickups,
      oilPumps,
      mountAdapters,
      bellhousingAdapters,
      controllers,
      ...(stockBeltLengthsMm.length > 0 && { stockBeltLengthsMm }),
    };
  }

  private goals(
    project: Project,
    engine: EngineSpec,
    selection: ProjectFitSelection | null,
    needed: string[],
    notes: string[],
  ): SwapGoals | null {
    let targetPowerKw = project.goalTargetPowerKw;
    if (targetPowerKw === null && engine.ratedPowerKw !== undefined) {
      targetPowerKw = engine.ratedPowerKw;
      notes.push(`No target power in the project's goals: used the engine's rated ${engine.ratedPowerKw} kW.`);
    }
    if (targetPowerKw === null) needed.push("set the target power in the project's goals (the engine has no rated power)");
    // No rev limit is no reason to stop: the checks that read it (oil pump and driveshaft speed) say they are not checked.
    if (targetPowerKw === null) return null;
    return {
      use: project.goalUse,
      targetPowerKw,
      ...(project.goalRevLimitRpm !== null && { revLimitRpm: project.goalRevLimitRpm }),
      ...(selection?.continuousPowerKw != null && { continuousPowerKw: selection.continuousPowerKw }),
      ...(selection?.topSpeedKph != null && { topSpeedKph: selection.topSpeedKph }),
      ...(selection?.tireDiameterMm != null && { tireDiameterMm: selection.tireDiameterMm }),
      ...(selection?.axleRatio != null && { axleRatio: selection.axleRatio }),
    };
  }

  private driveshaft(selection: ProjectFitSelection | null): FitSpec['driveshaft'] | null {
    if (!selection || selection.driveshaftOuterDiameterMm === null || selection.driveshaftWallMm === null) return null;
    return {
      outerDiameterMm: selection.driveshaftOuterDiameterMm,
      wallMm: selection.driveshaftWallMm,
      material: selection.driveshaftMaterial ?? 'steel',
      ...(selection.driveshaftLengthMm !== null && { lengthMm: selection.driveshaftLengthMm }),
      ...(selection.driveshaftSuspensionGrowthMm !== null && { suspensionGrowthMm: selection.driveshaftSuspensionGrowthMm }),
    };
  }

  /**
   * The project's placement; else the fit window's best placement, searched around where the chassis's stock
   * engine sat (or across the engine bay when that is unknown); else that stock placement itself.
   */
  private placement(
    project: Project,
    spec: Omit<FitSpec, 'placement'>,
    chassisRow: CatalogChassis,
    settingsOverrides: Partial<FitSettings>,
    needed: string[],
  ): { placement: Placement; source: PlacementSource } | null {
    if (project.placementSetbackMm !== null && project.placementHeightMm !== null && project.placementTiltDeg !== null) {
      return {
        placement: { setbackMm: project.placementSetbackMm, heightMm: project.placementHeightMm, tiltDeg: project.placementTiltDeg },
        source: 'project',
      };
    }
    const stock = chassisDefaultPlacement(chassisRow);
    const proposed = proposePlacement(spec, stock, settingsOverrides);
    if (proposed) return { placement: proposed, source: 'proposed' };
    if (stock) return { placement: stock, source: 'chassis-default' };
    needed.push("set the engine's placement on the project (no placement fits and the chassis has no stock placement)");
    return null;
  }
}

/** The drive the fit engine's belt check reads: the selected one, else the engine's first (none for an unknown id). */
export function chosenAccessoryDrive(engine: Pick<EngineSpec, 'accessoryDrives'>, accessoryDriveId?: string): AccessoryDriveSpec | null {
  if (accessoryDriveId !== undefined) return engine.accessoryDrives.find((drive) => drive.id === accessoryDriveId) ?? null;
  return engine.accessoryDrives[0] ?? null;
}

/** Effective lengths of the belts with the drive's rib count, shortest first, each length once. */
export function stockBeltLengthsFor(drive: Pick<AccessoryDriveSpec, 'ribs'>, belts: readonly SerpentineBeltSpec[]): number[] {
  const lengths = belts.filter((belt) => belt.ribs === drive.ribs).map((belt) => belt.effectiveLengthMm);
  return [...new Set(lengths)].sort((a, b) => a - b);
}

/** Where the search runs when the chassis has no stock placement: the usual engine bay, front axle to firewall. */
const OPEN_SEARCH = { setbackFromMm: 0, setbackToMm: 1500, stepMm: 10 };

/** The fit window's best placement (every clearance check passing with the largest margin), or null. */
export function proposePlacement(
  spec: Omit<FitSpec, 'placement'>,
  start: Placement | null,
  settingsOverrides: Partial<FitSettings>,
): Placement | null {
  const tiltDeg = start?.tiltDeg ?? resolveFitSettings(settingsOverrides).defaultTiltDeg;
  const placement = start ?? { setbackMm: (OPEN_SEARCH.setbackFromMm + OPEN_SEARCH.setbackToMm) / 2, heightMm: 500, tiltDeg };
  try {
    const window = computeFitWindow({ ...spec, placement }, start ? { tiltDeg } : { ...OPEN_SEARCH, tiltDeg }, settingsOverrides);
    return window.best?.placement ?? null;
  } catch {
    // A spec the window search cannot handle still gets a report at the stock placement.
    return null;
  }
}
