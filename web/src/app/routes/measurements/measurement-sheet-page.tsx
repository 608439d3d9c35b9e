import { Alert, Button, Card, Flex, Typography } from 'antd';
import { useMemo, useState } from 'react';
import { Link, useNavigate, useParams } from 'react-router-dom';
import { PageHeader } from '@/components/page-header';
import { EmptyState, ErrorState, LoadingState } from '@/components/query-state';
import { toProjectDetail, toProjectFit } from '@/config/paths';
import { useUnits } from '@/hooks/use-units';
import { notifySuccess } from '@/lib/notifier';
import { useSignedInUser } from '@/features/auth/api/get-current-user';
import { useAcceptMeasurementPhoto } from '@/features/measurements/api/accept-measurement-photo';
import { useDeleteMeasurementPhoto } from '@/features/measurements/api/delete-measurement-photo';
import { useMeasurementSheet } from '@/features/measurements/api/get-measurement-sheet';
import { useSetMeasurementValue } from '@/features/measurements/api/set-measurement-value';
import { useSignOffMeasurementSheet } from '@/features/measurements/api/sign-off-measurement-sheet';
import { MeasurementPointCard } from '@/features/measurements/components/measurement-point-card';
import { MeasurementSafety } from '@/features/measurements/components/measurement-safety';
import { PhotoStrip, type PhotoActions } from '@/features/measurements/components/photo-strip';
import { missingLabelsOf, SheetOverview } from '@/features/measurements/components/sheet-overview';
import { TemplateEditorDrawer } from '@/features/measurements/components/template-editor-drawer';
import { usePhotoUploads } from '@/features/measurements/hooks/use-photo-uploads';
import { sheetInUnits } from '@/features/measurements/lib/point-words';
import { filterRows, generalPhotos, initialFilter, sheetCounts, sheetRows, signOffEvent, type SheetFilter } from '@/features/measurements/lib/sheet-state';
import { useProject } from '@/features/projects/api/get-project';
import { canAddMeasurementPhotos, canMeasure, canRunFitCheck } from '../../navigation';

/** The fabricator's sheet at the truck: phone first, one card per point, the camera beside each reading. */
export function MeasurementSheetPage() {
  const { projectId = '' } = useParams();
  const user = useSignedInUser();
  const navigate = useNavigate();
  const units = useUnits();
  const project = useProject(projectId);
  const sheet = useMeasurementSheet(projectId);
  const setValue = useSetMeasurementValue(projectId);
  const signOff = useSignOffMeasurementSheet(projectId);
  const deletePhoto = useDeleteMeasurementPhoto(projectId);
  const acceptPhoto = useAcceptMeasurementPhoto(projectId);
  const uploads = usePhotoUploads(projectId);
  const [filter, setFilter] = useState<SheetFilter | null>(null);
  // points saved since the list was chosen stay in it (with their photo button) until the list changes or the page reloads
  const [justSaved, setJustSaved] = useState<ReadonlySet<string>>(() => new Set());
  const chooseFilter = (next: SheetFilter) => {
    setFilter(next);
    setJustSaved(new Set());
  };
  const [editingTemplate, setEditingTemplate] = useState(false);
  const canEdit = canMeasure(user.role);
  const isCustomer = user.role === 'customer';

  // points' names and how-tos in the person's units (the template writes millimetres)
  const shownSheet = useMemo(() => (sheet.data ? sheetInUnits(sheet.data, units.system) : undefined), [sheet.data, units.system]);
  const rows = useMemo(() => (shownSheet ? sheetRows(shownSheet) : []), [shownSheet]);
  const counts = useMemo(() => sheetCounts(rows), [rows]);

  if (project.isPending || sheet.isPending) return <LoadingState rows={10} />;
  if (project.isError) return <ErrorState error={project.error} onRetry={() => void project.refetch()} />;
  if (sheet.isError) return <ErrorState error={sheet.error} onRetry={() => void sheet.refetch()} />;
  const p = project.data;
  const s = shownSheet ?? sheet.data;
  const shown = filterRows(rows, filter ?? initialFilter(counts), justSaved);

  const photoActions: PhotoActions = {
    canAdd: canAddMeasurementPhotos(user.role),
    // a signed-off sheet keeps its photos as the record of what was measured
    canDelete: (photo) => s.signedOffAt === null && (photo.uploadedById === user.id || user.role === 'owner'),
    canReview: canEdit,
    pendingLabel: user.role === 'customer' ? 'Waiting for the shop' : 'From the customer',
    onAdd: uploads.add,
    onRetry: uploads.retry,
    onDismiss: uploads.dismiss,
    onDelete: (photo) => deletePhoto.mutateAsync(photo.id),
    onAccept: (photo) => acceptPhoto.mutate(photo.id),
  };
  const uploadsFor = (pointId: string | null) => uploads.uploads.filter((u) => u.pointId === pointId && u.replacesPhotoId === null);
  const general = generalPhotos(s);
  const replacing = uploads.uploads.filter((u) => u.replacesPhotoId !== null);

  return (
    <div style={{ maxWidth: 760, margin: '0 auto' }}>
      <Typography.Text>
        <Link to={toProjectDetail(p.id)} className="back-link">← {p.title}</Link>
      </Typography.Text>
      <PageHeader
        eyebrow={p.customer?.name}
        title="Measurement sheet"
        subtitle={p.vehicleDescription}
        extra={
          <>
            {canEdit && s.chassisId && <Button onClick={() => setEditingTemplate(true)}>Edit points</Button>}
            <Button onClick={() => navigate(toProjectFit(p.id))}>{canRunFitCheck(user.role) ? 'Fit check' : 'Fit report'}</Button>
          </>
        }
      />
      <Flex vertical gap={12}>
        <MeasurementSafety />
        {isCustomer ? (
          <Alert
            type="info"
            showIcon
            data-testid="customer-photo-help"
            title="Photos help the shop before the truck arrives"
            description="Add photos under a point (its drawing shows where) or under Other photos at the bottom. The shop's fabricator looks at each one and accepts it or takes a better one; until then it shows as waiting for the shop. The shop takes the readings itself."
          />
        ) : (
          !canEdit && (
            <Typography.Text type="secondary" data-testid="read-only-note">
              Readings are taken and signed off by a fabricator or the owner; you see them here as they come in.
            </Typography.Text>
          )
        )}
        {!s.chassisId ? (
          <Alert
            type="info"
            showIcon
            title="No chassis model chosen yet"
            description="The points to measure come from the project's chassis model. Choose one from the catalog on the project page first; photos can be added already."
          />
        ) : (
          <SheetOverview
            counts={counts}
            filter={filter ?? initialFilter(counts)}
            onFilter={chooseFilter}
            missingLabels={missingLabelsOf(s.points, s.missing)}
            signedOffAt={s.signedOffAt}
            signOff={signOffEvent(s)}
            canSignOff={canEdit}
            signingOff={signOff.isPending}
            onSignOff={() =>
              void signOff.mutateAsync().then(() => notifySuccess({ title: 'Sheet signed off', description: 'The next fit check runs on these readings.' }))
            }
          />
        )}
        {shown.length === 0 && s.chassisId && (
          <Card>
            <EmptyState description={filter === 'flagged' ? 'No reading is far from the catalog.' : 'Nothing in this list.'} />
          </Card>
        )}
        {shown.map((row) => (
          <MeasurementPointCard
            key={row.point.id}
            row={row}
            system={units.system}
            formatLength={(mm) => units.formatLength(mm)}
            signedOff={s.signedOffAt !== null}
            canEdit={canEdit}
            onSave={async (pointId, body) => {
              // the list in view is kept as it is, so the point does not vanish from Missing before its photo
              if (filter === null) setFilter(initialFilter(counts));
              await setValue.mutateAsync({ pointId, body });
              setJustSaved((saved) => new Set(saved).add(pointId));
              notifySuccess({ title: 'Reading saved', description: 'Add its photo now if it needs one.', key: 'reading-saved' });
            }}
            uploads={uploadsFor(row.point.id)}
            uploadedIds={uploads.uploadedIds}
            photoActions={photoActions}
          />
        ))}
        <Card size="small" title="Other photos" data-testid="general-photos">
          <Typography.Paragraph type="secondary" style={{ fontSize: 13 }}>
            {isCustomer
              ? 'Your truck as it is now, whole and from each side, and anything you want the shop to see.'
              : "The truck as it arrived, the customer's own pictures, anything not tied to one point."}
          </Typography.Paragraph>
          <PhotoStrip label="the truck" pointId={null} photos={general} uploads={[...uploadsFor(null), ...replacing]} uploadedIds={uploads.uploadedIds} actions={photoActions} />
        </Card>
      </Flex>
      {canEdit && s.chassisId && <TemplateEditorDrawer chassisId={s.chassisId} open={editingTemplate} onClose={() => setEditingTemplate(false)} />}
    </div>
  );
}
