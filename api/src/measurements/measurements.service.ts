import { Injectable } from '@nestjs/common';
import { InjectDataSource, InjectRepository } from '@nestjs/typeorm';
import {
  applyMeasurementSheet,
  DEFAULT_DEVIATION_LIMITS,
  formatLength,
  generateMeasurementTemplate,
  measurementUnit,
  missingPoints,
  parseMeasurementEntry,
  type AppliedMeasurements,
  type ChassisSpec,
  type MeasurementPoint,
} from '@swapwright/shared';
import { randomUUID } from 'node:crypto';
import { DataSource, EntityManager, Repository } from 'typeorm';
import { CatalogService } from '../catalog/catalog.service';
import { AuditService } from '../audit/audit.service';
import { AuthUser } from '../common/tenant/auth-user';
import { Project } from '../projects/project.entity';
import { ProjectsService } from '../projects/projects.service';
import { SetMeasurementValueDto, UploadPhotosDto } from './dto/measurement.dto';
import {
  MeasurementPhoto,
  MeasurementSettings,
  MeasurementSheet,
  MeasurementSheetEvent,
  MeasurementTemplate,
  MeasurementValue,
} from './measurement-sheet.entity';
import { MeasurementErrors } from './measurements.errors';
import { PhotoIntakeService, type UploadedPhotoFile } from './photo-intake.service';
import { PhotoStorage } from './photo-storage';
import { jsonCopy } from '../common/json/json-copy';

type Shop = Pick<AuthUser, 'shopId'>;

/** Everything a sheet screen shows, as domain objects; the mapper makes the response. */
export interface SheetView {
  project: Project;
  sheet: MeasurementSheet | null;
  points: MeasurementPoint[];
  values: MeasurementValue[];
  events: MeasurementSheetEvent[];
  photos: MeasurementPhoto[];
  applied: AppliedMeasurements | null;
}

export type { UploadedPhotoFile } from './photo-intake.service';

@Injectable()
export class MeasurementsService {
  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    @InjectRepository(MeasurementTemplate) private readonly templates: Repository<MeasurementTemplate>,
    @InjectRepository(MeasurementSheet) private readonly sheets: Repository<MeasurementSheet>,
    @InjectRepository(MeasurementValue) private readonly values: Repository<MeasurementValue>,
    @InjectRepository(MeasurementSheetEvent) private readonly events: Repository<MeasurementSheetEvent>,
    @InjectRepository(MeasurementPhoto) private readonly photos: Repository<MeasurementPhoto>,
    @InjectRepository(MeasurementSettings) private readonly settings: Repository<MeasurementSettings>,
    private readonly projects: ProjectsService,
    private readonly catalog: CatalogService,
    private readonly storage: PhotoStorage,
    private readonly intake: PhotoIntakeService,
    private readonly audit: AuditService,
  ) {}

  /**
   * The chassis model's points: the shop's edited template, else generated from the catalog chassis. A chassis id
   * that is not in the catalog is `notFound` (a project whose chassis is gone: choose one first).
   */
  async template(user: Shop, chassisId: string, notFound: () => Error = MeasurementErrors.noChassis): Promise<MeasurementPoint[]> {
    const stored = await this.templates.findOne({ where: { shopId: user.shopId, chassisId } });
    if (stored) return stored.points;
    const chassis = await this.catalog.findSpec<ChassisSpec>('chassis', user, chassisId);
    if (!chassis) throw notFound();
    return generateMeasurementTemplate(chassis);
  }

  /** A catalog chassis model's template (404 when the chassis is not in the shop's catalog). */
  chassisTemplate(user: Shop, chassisId: string): Promise<MeasurementPoint[]> {
    return this.template(user, chassisId, MeasurementErrors.chassisNotFound);
  }

  async putTemplate(user: AuthUser, chassisId: string, points: MeasurementPoint[]): Promise<MeasurementPoint[]> {
    const chassis = await this.catalog.findSpec<ChassisSpec>('chassis', user, chassisId);
    if (!chassis) throw MeasurementErrors.chassisNotFound();
    const ids = new Set<string>();
    for (const point of points) {
      if (ids.has(point.id)) throw MeasurementErrors.badValue(`Point id "${point.id}" appears twice.`);
      ids.add(point.id);
    }
    const clean = points.map((p) => jsonCopy<MeasurementPoint>(p));
    const existing = await this.templates.findOne({ where: { shopId: user.shopId, chassisId } });
    await this.templates.save({ id: existing?.id ?? randomUUID(), shopId: user.shopId, chassisId, points: clean, updatedById: user.userId });
    return clean;
  }

  async limits(user: Shop): Promise<{ lengthMm: number; angleDeg: number }> {
    const row = await this.settings.findOne({ where: { shopId: user.shopId } });
    return row ? { lengthMm: row.deviationLimitMm, angleDeg: row.deviationLimitDeg } : DEFAULT_DEVIATION_LIMITS;
  }

  async putLimits(user: Shop, lengthMm: number, angleDeg: number): Promise<{ lengthMm: number; angleDeg: number }> {
    await this.settings.save({ shopId: user.shopId, deviationLimitMm: lengthMm, deviationLimitDeg: angleDeg });
    return this.limits(user);
  }

  async view(user: AuthUser, projectId: string): Promise<SheetView> {
    const project = await this.projects.get(user, projectId);
    const sheet = await this.sheets.findOne({ where: { shopId: user.shopId, projectId: project.id } });
    const points = project.chassisModelId ? await this.template(user, project.chassisModelId) : [];
    const [values, events, photos] = sheet
      ? await Promise.all([
          this.values.find({ where: { sheetId: sheet.id }, order: { pointId: 'ASC' } }),
          this.events.find({ where: { sheetId: sheet.id }, order: { at: 'DESC' }, take: 200 }),
          this.photos.find({ where: { sheetId: sheet.id }, order: { createdAt: 'ASC' } }),
        ])
      : [[], [], []];
    const applied = await this.appliedFor(user, project, values, points);
    return { project, sheet, points, values, events, photos, applied };
  }

  /** The project's chassis as measured (null without a catalog chassis): the fit check's input. */
  async appliedFor(user: Shop, project: Project, values?: MeasurementValue[], points?: MeasurementPoint[]): Promise<AppliedMeasurements | null> {
    const chassis = await this.catalog.findSpec<ChassisSpec>('chassis', user, project.chassisModelId);
    if (!chassis) return null;
    const pts = points ?? (await this.template(user, project.chassisModelId!));
    let vals = values;
    if (!vals) {
      const sheet = await this.sheets.findOne({ where: { shopId: user.shopId, projectId: project.id } });
      vals = sheet ? await this.values.find({ where: { sheetId: sheet.id } }) : [];
    }
    const measured = vals.map((v) => ({ pointId: v.pointId, value: v.value, measuredBy: v.measuredByName, measuredAt: v.measuredAt.toISOString() }));
    return applyMeasurementSheet(chassis, pts, measured, await this.limits(user));
  }

  private async pointOf(user: Shop, project: Project, pointId: string): Promise<MeasurementPoint> {
    if (!project.chassisModelId) throw MeasurementErrors.noChassis();
    const point = (await this.template(user, project.chassisModelId)).find((p) => p.id === pointId);
    if (!point) throw MeasurementErrors.unknownPoint(pointId);
    return point;
  }

  /**
   * Runs `work` in a transaction with the project's sheet row locked. The row is made first, in a statement of its own
   * before the transaction: a locking read of a row that does not exist yet takes a gap lock, and two first readings on
   * different projects in the same gap would each wait for the other's insert (a deadlock, which reached the user as a
   * 500). It runs before the transaction, not inside it on a second connection: a transaction holding one pooled
   * connection while it waits for another hangs for good once parallel saves hold every connection of the pool.
   */
  private async inLockedSheet<T>(user: Shop, projectId: string, work: (manager: EntityManager, sheet: MeasurementSheet) => Promise<T>): Promise<T> {
    await this.dataSource
      .createQueryBuilder()
      .insert()
      .into(MeasurementSheet)
      .values({ id: randomUUID(), shopId: user.shopId, projectId, signedOffAt: null, signedOffById: null })
      .orIgnore()
      .execute();
    return this.dataSource.transaction(async (manager) => {
      const sheet = await manager.findOneOrFail(MeasurementSheet, { where: { shopId: user.shopId, projectId }, lock: { mode: 'pessimistic_write' } });
      return work(manager, sheet);
    });
  }

  private event(user: AuthUser, sheet: MeasurementSheet, fields: Partial<MeasurementSheetEvent>): MeasurementSheetEvent {
    return { id: randomUUID(), shopId: user.shopId, sheetId: sheet.id, kind: 'value', pointId: null, oldValue: null, newValue: null, reason: null, byId: user.userId, byName: user.name, at: new Date(), ...fields };
  }

  /**
   * Records a reading; the old one goes to the history. After sign-off a reason is required and logged. With
   * `seenVersion`, a reading saved by someone else since the person looked is not replaced (409, nothing written).
   */
  async setValue(user: AuthUser, projectId: string, pointId: string, input: SetMeasurementValueDto): Promise<void> {
    const project = await this.projects.get(user, projectId);
    const point = await this.pointOf(user, project, pointId);
    const parsed = parseMeasurementEntry(input.value, point.kind, input.unit ?? 'mm');
    if (!parsed.ok) throw MeasurementErrors.badValue(`value: ${parsed.message}`);
    let tolerance: number | null = null;
    if (input.tolerance !== undefined && input.tolerance.trim() !== '') {
      const tol = parseMeasurementEntry(input.tolerance, point.kind, input.unit ?? 'mm');
      if (!tol.ok || tol.value < 0) throw MeasurementErrors.badValue(`tolerance: ${tol.ok ? 'must not be negative' : tol.message}`);
      tolerance = tol.value;
    }
    await this.inLockedSheet(user, project.id, async (manager, sheet) => {
      const reason = input.reason?.trim() || null;
      if (sheet.signedOffAt && !reason) throw MeasurementErrors.reasonRequired();
      // the sheet row is locked, so no other save of this sheet runs between this read and the write below
      const old = await manager.findOne(MeasurementValue, { where: { sheetId: sheet.id, pointId } });
      if (input.seenVersion !== undefined && input.seenVersion !== (old?.version ?? 0)) {
        if (!old) throw MeasurementErrors.badValue(`seenVersion: "${point.label}" has no reading yet; send 0.`);
        throw MeasurementErrors.readingChanged(
          { by: old.measuredByName, reading: readingText(old.value, point), at: `${old.measuredAt.toISOString().slice(11, 16)} UTC` },
          readingText(parsed.value, point),
        );
      }
      if (sheet.signedOffAt) {
        // a signed-off sheet changes only with a reason, and the change goes to the shop's audit log with it
        await this.audit.record(manager, {
          shopId: user.shopId,
          actor: user,
          kind: 'sign-off',
          action: 'sheet.changed-after-sign-off',
          subjectId: sheet.id,
          summary: `${point.label} of ${project.title} changed after sign-off: ${reason}`,
          before: { pointId, value: old?.value ?? null },
          after: { pointId, value: parsed.value, reason },
        });
      }
      const row: MeasurementValue = {
        id: old?.id ?? randomUUID(),
        shopId: user.shopId,
        sheetId: sheet.id,
        pointId,
        value: parsed.value,
        tolerance,
        note: input.note?.trim() || null,
        measuredById: user.userId,
        measuredByName: user.name,
        measuredAt: new Date(),
        version: (old?.version ?? 0) + 1,
      };
      await manager.save(MeasurementValue, row);
      await manager.insert(MeasurementSheetEvent, this.event(user, sheet, { pointId, oldValue: old?.value ?? null, newValue: parsed.value, reason }));
    });
  }

  async signOff(user: AuthUser, projectId: string): Promise<void> {
    const project = await this.projects.get(user, projectId);
    if (!project.chassisModelId) throw MeasurementErrors.noChassis();
    const points = await this.template(user, project.chassisModelId);
    await this.inLockedSheet(user, project.id, async (manager, sheet) => {
      if (sheet.signedOffAt) throw MeasurementErrors.alreadySignedOff();
      const measured = await manager.find(MeasurementValue, { where: { sheetId: sheet.id } });
      const missing = missingPoints(points, new Set(measured.map((v) => v.pointId)));
      if (missing.length > 0) throw MeasurementErrors.incomplete(missing.map((p) => p.label));
      await this.audit.record(manager, {
        shopId: user.shopId,
        actor: user,
        kind: 'sign-off',
        action: 'sheet.signed-off',
        subjectId: sheet.id,
        summary: `Measurement sheet of ${project.title} signed off with ${measured.length} readings.`,
        before: { signedOffAt: null },
        after: { signedOffAt: new Date().toISOString(), signedOffById: user.userId, readings: measured.length },
      });
      await manager.update(MeasurementSheet, { id: sheet.id }, { signedOffAt: new Date(), signedOffById: user.userId });
      await manager.insert(MeasurementSheetEvent, this.event(user, sheet, { kind: 'sign-off' }));
      await this.projects.advanceStatus(user.shopId, project.id, 'measured', manager);
    });
  }

  /**
   * Checks every file by its content, strips location metadata, stores files under generated names and the rows in
   * one transaction; if anything fails, the files written so far are removed (no orphans).
   */
  async addPhotos(user: AuthUser, projectId: string, files: UploadedPhotoFile[], input: UploadPhotosDto): Promise<MeasurementPhoto[]> {
    const project = await this.projects.get(user, projectId);
    if (!files || files.length === 0) throw MeasurementErrors.photoNoFiles();
    if (input.pointId) await this.pointOf(user, project, input.pointId);
    if (input.replacesPhotoId && user.role === 'customer') throw MeasurementErrors.photoReplaceForbidden();
    const prepared = await this.intake.prepare(files);
    const written: string[] = [];
    let replaced: MeasurementPhoto | null = null;
    try {
      const rows = await this.inLockedSheet(user, project.id, async (manager, sheet) => {
        if (input.replacesPhotoId) {
          replaced = await manager.findOne(MeasurementPhoto, { where: { id: input.replacesPhotoId.toLowerCase(), sheetId: sheet.id } });
          if (!replaced) throw MeasurementErrors.photoNotFound();
          if (replaced.status !== 'pending') throw MeasurementErrors.photoNotPending();
          await manager.delete(MeasurementPhoto, { id: replaced.id });
        }
        const out: MeasurementPhoto[] = [];
        for (const { image, data, key } of prepared) {
          const row = manager.create(MeasurementPhoto, {
            id: randomUUID(),
            shopId: user.shopId,
            sheetId: sheet.id,
            projectId: project.id,
            pointId: input.pointId ?? replaced?.pointId ?? null,
            storageKey: key,
            contentType: image.contentType,
            bytes: data.length,
            widthPx: image.width,
            heightPx: image.height,
            status: user.role === 'customer' ? 'pending' : 'accepted',
            uploadedById: user.userId,
            uploadedByName: user.name,
          });
          await manager.insert(MeasurementPhoto, row);
          await this.storage.put(key, data);
          written.push(key);
          out.push(row);
        }
        return out;
      });
      if (replaced) await this.storage.remove((replaced as MeasurementPhoto).storageKey);
      const stored = new Map((await this.photos.find({ where: rows.map((r) => ({ id: r.id })) })).map((p) => [p.id, p]));
      return rows.map((r) => stored.get(r.id)!);
    } catch (error) {
      await Promise.all(written.map((key) => this.storage.remove(key)));
      throw error;
    }
  }

  /** A photo of a project the caller may see (another shop's, or another customer's, is not found). */
  private async visiblePhoto(user: AuthUser, photoId: string): Promise<MeasurementPhoto> {
    const photo = await this.photos.findOne({ where: { id: photoId, shopId: user.shopId } });
    if (!photo) throw MeasurementErrors.photoNotFound();
    try {
      await this.projects.get(user, photo.projectId);
    } catch {
      throw MeasurementErrors.photoNotFound();
    }
    return photo;
  }

  async photoFile(user: AuthUser, photoId: string): Promise<{ photo: MeasurementPhoto; data: Buffer }> {
    const photo = await this.visiblePhoto(user, photoId);
    const data = await this.storage.get(photo.storageKey);
    if (!data) throw MeasurementErrors.photoNotFound();
    return { photo, data };
  }

  /**
   * Removes a photo (its uploader or the owner) while its sheet is open; a signed-off sheet keeps its photos as the
   * record of what was measured. The sheet row is locked, so a sign-off at the same moment waits for the removal or
   * the removal sees the sign-off; the file goes once the row's removal has committed.
   */
  async deletePhoto(user: AuthUser, photoId: string): Promise<void> {
    const photo = await this.visiblePhoto(user, photoId);
    if (photo.uploadedById !== user.userId && user.role !== 'owner') throw MeasurementErrors.photoForbidden();
    await this.dataSource.transaction(async (manager) => {
      const sheet = await manager.findOne(MeasurementSheet, { where: { id: photo.sheetId, shopId: user.shopId }, lock: { mode: 'pessimistic_write' } });
      if (sheet?.signedOffAt) throw MeasurementErrors.photoSignedOff();
      const removed = await manager.delete(MeasurementPhoto, { id: photo.id, shopId: user.shopId });
      if (!removed.affected) throw MeasurementErrors.photoNotFound();
    });
    await this.intake.discard(photo.storageKey);
  }

  async acceptPhoto(user: AuthUser, photoId: string): Promise<MeasurementPhoto> {
    const photo = await this.visiblePhoto(user, photoId);
    if (photo.status !== 'pending') throw MeasurementErrors.photoNotPending();
    await this.photos.update({ id: photo.id }, { status: 'accepted' });
    return { ...photo, status: 'accepted' };
  }
}

/** A stored reading in a message: `17 1/2 in (444.5 mm)` for a length, `2.5°` for an angle. */
function readingText(value: number, point: MeasurementPoint): string {
  if (measurementUnit(point.kind) === 'deg') return `${Math.round(value * 100) / 100}°`;
  return `${formatLength(value, { unit: 'in' })} (${formatLength(value, { unit: 'mm' })})`;
}
