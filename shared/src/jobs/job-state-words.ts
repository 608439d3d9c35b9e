/** The app's words for a background job's state: on the background work list and in the audit log. */
export const JOB_STATE_LABELS: Record<'queued' | 'running' | 'done' | 'dead', string> = {
  queued: 'Waiting',
  running: 'Running',
  done: 'Done',
  dead: 'Stopped',
};
