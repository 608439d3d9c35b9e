import { useQueryClient } from '@tanstack/react-query';
import { Button, Flex, Image, Popconfirm, Progress, Typography } from 'antd';
import { useEffect, useRef, useState } from 'react';
import { CameraButton, CameraIcon } from '@/components/camera-button';
import { PhotoThumb, PhotoTile, UploadPreview } from '@/components/photo-tile';
import { getErrorMessage, retryCanHelp } from '@/lib/api-error';
import { formatDateTime } from '@/lib/dates';
import { useCheckPhotoUrl } from '../api/get-check-photo-file';
import { useRemoveCheckPhoto } from '../api/remove-check-photo';
import { uploadCheckPhoto } from '../api/upload-check-photo';
import { workOrderKeys } from '../api/work-order-keys';
import type { WorkCheck } from '../types';

type Stored = WorkCheck['photos'][number];

/** One photo on its way up, with a thumbnail made in the browser from the file itself. */
interface Upload {
  key: string;
  file: File;
  previewUrl: string;
  percent: number;
  error: string | null;
  /** False when the server refused the file's kind: sending it again cannot help, only another file. */
  retryable: boolean;
}

export interface CheckPhotosProps {
  workOrderId: string;
  check: WorkCheck;
  /** Adding and removing are open while the job is in the bay, to those who record checks (a finished job keeps its photos). */
  canAdd: boolean;
}

let counter = 0;

/** A finger-sized height on a phone. */
const TOUCH = 40;

function StoredPhoto({ photo, alt, onRemove }: { photo: Stored; alt: string; onRemove: ((photo: Stored) => Promise<unknown>) | null }) {
  const { url, isError } = useCheckPhotoUrl(photo.id);
  const taken = `${photo.uploadedByName}, ${formatDateTime(photo.createdAt)}`;
  return (
    <PhotoTile
      testId="check-photo"
      footer={
        <Flex vertical gap={2}>
          <Typography.Text type="secondary" style={{ fontSize: 11, lineHeight: 1.2 }}>
            {taken}
          </Typography.Text>
          {onRemove && (
            <Popconfirm
              title="Remove this photo?"
              description="It is taken off the check and deleted."
              okText="Remove"
              cancelText="Keep"
              okButtonProps={{ danger: true }}
              // below the button, so the photo in question stays in view
              placement="bottom"
              // a refusal (the job was finished meanwhile) shows as the API client's notification
              onConfirm={() => onRemove(photo).catch(() => undefined)}
            >
              <Button danger type="text" block style={{ height: TOUCH, paddingInline: 0 }} aria-label={`Remove photo (${taken})`}>
                Remove
              </Button>
            </Popconfirm>
          )}
        </Flex>
      }
    >
      <PhotoThumb url={url} isError={isError} alt={alt} />
    </PhotoTile>
  );
}

/** A check's optional photos: thumbnails (tap for the viewer), each upload with its progress and retry, and the camera button. */
export function CheckPhotos({ workOrderId, check, canAdd }: CheckPhotosProps) {
  const queryClient = useQueryClient();
  const remove = useRemoveCheckPhoto(workOrderId);
  const [uploads, setUploads] = useState<Upload[]>([]);
  const live = useRef(new Set<AbortController>());
  const alt = `Photo: ${check.label}`;

  useEffect(() => {
    const controllers = live.current;
    return () => controllers.forEach((controller) => controller.abort());
  }, []);

  const patch = (key: string, change: Partial<Upload>) => setUploads((list) => list.map((u) => (u.key === key ? { ...u, ...change } : u)));
  const drop = (key: string) =>
    setUploads((list) => {
      const gone = list.find((u) => u.key === key);
      if (gone) URL.revokeObjectURL(gone.previewUrl);
      return list.filter((u) => u.key !== key);
    });

  const send = async (upload: Upload) => {
    const controller = new AbortController();
    live.current.add(controller);
    patch(upload.key, { percent: 0, error: null });
    try {
      const order = await uploadCheckPhoto({
        workOrderId,
        checkKey: check.key,
        file: upload.file,
        signal: controller.signal,
        onProgress: (fraction) => patch(upload.key, { percent: Math.min(99, Math.round(fraction * 100)) }),
      });
      // the stored photo takes the upload's place
      queryClient.setQueryData(workOrderKeys.detail(order.id), order);
      drop(upload.key);
    } catch (error) {
      if (!controller.signal.aborted) patch(upload.key, { error: getErrorMessage(error), retryable: retryCanHelp(error) });
    } finally {
      live.current.delete(controller);
    }
  };

  const add = (files: File[]) => {
    const added = files.map((file) => ({ key: `check-upload-${++counter}`, file, previewUrl: URL.createObjectURL(file), percent: 0, error: null, retryable: true }));
    setUploads((list) => [...list, ...added]);
    for (const upload of added) void send(upload);
  };

  if (check.photos.length === 0 && uploads.length === 0 && !canAdd) return null;
  return (
    <Flex vertical gap={8} style={{ marginTop: 8 }} data-testid="check-photos">
      {(check.photos.length > 0 || uploads.length > 0) && (
        <Image.PreviewGroup>
          <Flex gap={10} wrap>
            {check.photos.map((photo) => (
              <StoredPhoto key={photo.id} photo={photo} alt={alt} onRemove={canAdd ? (gone) => remove.mutateAsync(gone.id) : null} />
            ))}
            {uploads.map((upload) => (
              <PhotoTile
                key={upload.key}
                testId="check-photo-upload"
                wide={upload.error !== null}
                footer={
                  <Flex vertical gap={2}>
                    <Progress percent={upload.percent} size="small" status={upload.error ? 'exception' : 'active'} aria-label={`Upload of ${upload.file.name}`} />
                    {upload.error && (
                      <>
                        <Typography.Text type="danger" style={{ fontSize: 11, lineHeight: 1.2 }} role="alert">
                          {upload.error}
                        </Typography.Text>
                        <Flex gap={4}>
                          {upload.retryable && (
                            <Button size="small" type="primary" onClick={() => void send(upload)}>
                              Retry
                            </Button>
                          )}
                          <Button size="small" onClick={() => drop(upload.key)}>
                            Discard
                          </Button>
                        </Flex>
                      </>
                    )}
                  </Flex>
                }
              >
                <UploadPreview url={upload.previewUrl} alt={alt} faded />
              </PhotoTile>
            ))}
          </Flex>
        </Image.PreviewGroup>
      )}
      {canAdd && (
        <div>
          <CameraButton size="middle" label={`Take or add photos: ${check.label}`} onFiles={add}>
            <CameraIcon /> Photo
          </CameraButton>
        </div>
      )}
    </Flex>
  );
}
