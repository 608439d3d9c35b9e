import { useQueryClient } from '@tanstack/react-query';
import { useCallback, useEffect, useRef, useState } from 'react';
import { getErrorMessage, retryCanHelp } from '@/lib/api-error';
import { measurementKeys } from '../api/measurement-keys';
import { uploadMeasurementPhotos } from '../api/upload-measurement-photos';
import type { MeasurementPhoto } from '../types';

export type PhotoUploadStatus = 'uploading' | 'done' | 'failed';

/** One photo on its way up: each goes in its own request, so each has its own progress and retry. */
export interface PhotoUpload {
  key: string;
  file: File;
  pointId: string | null;
  replacesPhotoId: string | null;
  /** 0 to 100. */
  percent: number;
  status: PhotoUploadStatus;
  error: string | null;
  /** False when the server refused the file's kind: sending it again cannot help, only another file. */
  retryable: boolean;
  /** A thumbnail made in the browser from the file itself, shown before and while it uploads. */
  previewUrl: string;
  stored: MeasurementPhoto | null;
}

let counter = 0;

/**
 * Uploads photos for a project's sheet one request per photo, with progress, retry of a failed one, and a local
 * thumbnail. A finished upload stays listed (its thumbnail is the file itself) until it is dismissed or deleted.
 */
export function usePhotoUploads(projectId: string) {
  const client = useQueryClient();
  const [uploads, setUploads] = useState<PhotoUpload[]>([]);
  const live = useRef(new Map<string, AbortController>());

  const patch = useCallback((key: string, change: Partial<PhotoUpload>) => {
    setUploads((list) => list.map((u) => (u.key === key ? { ...u, ...change } : u)));
  }, []);

  const send = useCallback(
    async (upload: Pick<PhotoUpload, 'key' | 'file' | 'pointId' | 'replacesPhotoId'>) => {
      const controller = new AbortController();
      live.current.set(upload.key, controller);
      patch(upload.key, { status: 'uploading', percent: 0, error: null });
      try {
        const [stored] = await uploadMeasurementPhotos(projectId, {
          files: [upload.file],
          pointId: upload.pointId ?? undefined,
          replacesPhotoId: upload.replacesPhotoId ?? undefined,
          signal: controller.signal,
          onProgress: (fraction) => patch(upload.key, { percent: Math.min(99, Math.round(fraction * 100)) }),
        });
        patch(upload.key, { status: 'done', percent: 100, stored: stored ?? null });
        await client.invalidateQueries({ queryKey: measurementKeys.sheet(projectId) });
      } catch (error) {
        if (controller.signal.aborted) return;
        patch(upload.key, { status: 'failed', error: getErrorMessage(error), retryable: retryCanHelp(error) });
      } finally {
        live.current.delete(upload.key);
      }
    },
    [client, patch, projectId],
  );

  /** Starts one upload per file. */
  const add = useCallback(
    (files: File[], target: { pointId?: string | null; replacesPhotoId?: string | null } = {}) => {
      const added = files.map((file) => ({
        key: `upload-${++counter}`,
        file,
        pointId: target.pointId ?? null,
        replacesPhotoId: target.replacesPhotoId ?? null,
        percent: 0,
        status: 'uploading' as const,
        error: null,
        retryable: true,
        previewUrl: URL.createObjectURL(file),
        stored: null,
      }));
      setUploads((list) => [...list, ...added]);
      for (const upload of added) void send(upload);
    },
    [send],
  );

  const retry = useCallback(
    (key: string) => {
      const upload = uploads.find((u) => u.key === key);
      if (upload) void send(upload);
    },
    [send, uploads],
  );

  /** Drops an upload from the list (cancelling it if it is still going). */
  const dismiss = useCallback((key: string) => {
    live.current.get(key)?.abort();
    setUploads((list) => {
      const gone = list.find((u) => u.key === key);
      if (gone) URL.revokeObjectURL(gone.previewUrl);
      return list.filter((u) => u.key !== key);
    });
  }, []);

  useEffect(() => {
    const controllers = live.current;
    return () => controllers.forEach((c) => c.abort());
  }, []);

  /** Stored photos that this page uploaded (shown through their upload, not fetched again). */
  const uploadedIds = new Set(uploads.flatMap((u) => (u.stored ? [u.stored.id] : [])));

  return { uploads, uploadedIds, add, retry, dismiss };
}

export type PhotoUploads = ReturnType<typeof usePhotoUploads>;
