import { Button, Flex, Image, Popconfirm, Progress, Tag, Typography } from 'antd';
import { CameraButton, CameraIcon } from '@/components/camera-button';
import { PhotoThumb, PhotoTile, UploadPreview } from '@/components/photo-tile';
import { formatDateTime } from '@/lib/dates';
import { useMeasurementPhotoUrl } from '../api/get-measurement-photo-file';
import type { PhotoUpload } from '../hooks/use-photo-uploads';
import type { MeasurementPhoto } from '../types';

export type PhotoActions = {
  canAdd: boolean;
  /** Whether this person may delete the photo (its uploader or the owner, while the sheet is not signed off). */
  canDelete: (photo: MeasurementPhoto) => boolean;
  /** Accept or replace a customer's photo (fabricator or owner). */
  canReview: boolean;
  /** What a customer's photo not yet accepted is called for this person ("Waiting for the shop" to the customer). */
  pendingLabel: string;
  onAdd: (files: File[], target: { pointId?: string | null; replacesPhotoId?: string | null }) => void;
  onRetry: (key: string) => void;
  onDismiss: (key: string) => void;
  onDelete: (photo: MeasurementPhoto) => Promise<unknown>;
  onAccept: (photo: MeasurementPhoto) => void;
};

/** A finger-sized button height on a phone. */
const TOUCH = 40;

const uploadedAt = (photo: MeasurementPhoto) => `${photo.uploadedBy}, ${formatDateTime(photo.createdAt)}`;

/** A customer's photo not accepted yet; the words wrap inside the narrow tile. */
function PendingTag({ label }: { label: string }) {
  return (
    <Tag color="gold" style={{ whiteSpace: 'normal', lineHeight: 1.25, marginInlineEnd: 0, paddingBlock: 1, textAlign: 'center' }}>
      {label}
    </Tag>
  );
}

function DeleteButton({ onConfirm }: { onConfirm: () => unknown }) {
  return (
    <Popconfirm title="Delete this photo?" okText="Delete" okButtonProps={{ danger: true }} onConfirm={onConfirm}>
      <Button danger type="text" style={{ paddingInline: 0, alignSelf: 'flex-start' }}>
        Delete
      </Button>
    </Popconfirm>
  );
}

function StoredPhoto({ photo, alt, actions }: { photo: MeasurementPhoto; alt: string; actions: PhotoActions }) {
  const { url, isError } = useMeasurementPhotoUrl(photo.id);
  return (
    <PhotoTile
      testId="photo-thumb"
      footer={
        <Flex vertical gap={2}>
          {photo.status === 'pending' && <PendingTag label={actions.pendingLabel} />}
          <Typography.Text type="secondary" style={{ fontSize: 11, lineHeight: 1.2 }}>
            {uploadedAt(photo)}
          </Typography.Text>
          {photo.status === 'pending' && actions.canReview && (
            <Flex vertical gap={6} style={{ marginTop: 2 }}>
              <Button block style={{ height: TOUCH }} aria-label={`Accept the customer's photo (${uploadedAt(photo)})`} onClick={() => actions.onAccept(photo)}>
                Accept
              </Button>
              <CameraButton
                block
                label={`Replace the customer's photo (${uploadedAt(photo)})`}
                onFiles={(files) => actions.onAdd(files.slice(0, 1), { replacesPhotoId: photo.id })}
              >
                Replace
              </CameraButton>
            </Flex>
          )}
          {actions.canDelete(photo) && <DeleteButton onConfirm={() => actions.onDelete(photo)} />}
        </Flex>
      }
    >
      <PhotoThumb url={url} isError={isError} alt={alt} />
    </PhotoTile>
  );
}

function UploadTile({ upload, alt, actions }: { upload: PhotoUpload; alt: string; actions: PhotoActions }) {
  const stored = upload.stored;
  return (
    <PhotoTile
      testId={upload.status === 'done' ? 'photo-thumb' : 'photo-upload'}
      wide={upload.status === 'failed'}
      footer={
        <Flex vertical gap={2}>
          <Progress
            percent={upload.percent}
            size="small"
            status={upload.status === 'failed' ? 'exception' : upload.status === 'done' ? 'success' : 'active'}
            aria-label={`Upload of ${upload.file.name}`}
          />
          {upload.status === 'done' && (
            <Typography.Text type="secondary" style={{ fontSize: 11 }}>
              Uploaded
            </Typography.Text>
          )}
          {upload.status === 'failed' && (
            <>
              <Typography.Text type="danger" style={{ fontSize: 11, lineHeight: 1.2 }} role="alert">
                {upload.error}
              </Typography.Text>
              <Flex vertical gap={6}>
                {upload.retryable && (
                  <Button block type="primary" style={{ height: TOUCH }} onClick={() => actions.onRetry(upload.key)}>
                    Retry
                  </Button>
                )}
                <Button block style={{ height: TOUCH }} onClick={() => actions.onDismiss(upload.key)}>
                  Discard
                </Button>
              </Flex>
            </>
          )}
          {stored?.status === 'pending' && <PendingTag label={actions.pendingLabel} />}
          {stored && actions.canDelete(stored) && (
            <DeleteButton
              onConfirm={async () => {
                await actions.onDelete(stored);
                actions.onDismiss(upload.key);
              }}
            />
          )}
        </Flex>
      }
    >
      <UploadPreview url={upload.previewUrl} alt={alt} faded={upload.status !== 'done'} />
    </PhotoTile>
  );
}

export type PhotoStripProps = {
  /** What the photos show, for the camera button and the thumbnails' text. */
  label: string;
  pointId: string | null;
  photos: MeasurementPhoto[];
  uploads: PhotoUpload[];
  /** Stored photos shown through their upload tile. */
  uploadedIds: ReadonlySet<string>;
  actions: PhotoActions;
};

/** A point's photos: thumbnails (tap for the full-size viewer), uploads with progress and retry, and the camera button. */
export function PhotoStrip({ label, pointId, photos, uploads, uploadedIds, actions }: PhotoStripProps) {
  const stored = photos.filter((p) => !uploadedIds.has(p.id));
  const alt = `Photo: ${label}`;
  return (
    <Flex vertical gap={8}>
      {(stored.length > 0 || uploads.length > 0) && (
        <Image.PreviewGroup>
          <Flex gap={10} wrap>
            {stored.map((photo) => (
              <StoredPhoto key={photo.id} photo={photo} alt={alt} actions={actions} />
            ))}
            {uploads.map((upload) => (
              <UploadTile key={upload.key} upload={upload} alt={alt} actions={actions} />
            ))}
          </Flex>
        </Image.PreviewGroup>
      )}
      {actions.canAdd && (
        <div>
          <CameraButton label={`Take or add photos: ${label}`} onFiles={(files) => actions.onAdd(files, { pointId })}>
            <CameraIcon /> Add photo
          </CameraButton>
        </div>
      )}
    </Flex>
  );
}
