import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it, vi } from 'vitest';
import type { Job, JobPage } from '@/features/jobs/types';
import { AxiosError } from 'axios';
import { JOBS_REFRESH_MS } from '@/features/jobs/api/get-jobs';
import { apiClient } from '@/lib/api-client';
import { renderWithApp } from '@/test/render';
import { BackgroundWorkPage } from '../background-work-page';

const stopped: Job = {
  id: 'job-quote-mail',
  kind: 'quote.mail',
  subject: 'Quote Q-0007 (revision 1) e-mail to marlo@example.com',
  state: 'dead',
  attempts: 8,
  maxAttempts: 8,
  lastError: "The customer has no e-mail address. Add one on the customer's page, then try again.",
  lastErrorDetail: 'the customer of this quote has no e-mail address any more',
  runAt: '2026-12-03T07:40:00.000Z',
  createdAt: '2026-12-03T06:00:00.000Z',
  updatedAt: '2026-12-03T07:40:00.000Z',
  doneAt: null,
};

const sent: Job = {
  ...stopped,
  id: 'job-invite',
  kind: 'mail',
  subject: 'E-mail to new.hand@example.com: “Join Ironbark Swap Works”',
  state: 'done',
  attempts: 1,
  lastError: null,
  lastErrorDetail: null,
  doneAt: '2026-12-03T06:00:02.000Z',
};

const pageOfJobs = (items: Job[], counts: JobPage['counts']): JobPage => ({ items, total: items.length, page: 1, pageSize: 20, counts });

describe('BackgroundWorkPage', () => {
  it('lists the work with what stopped it; "Try again" says what happens, queues it again, thanks and refreshes the list', async () => {
    const get = vi.spyOn(apiClient, 'get').mockImplementation(async (_url, config) => {
      const state = (config?.params as { state?: string }).state;
      if (state === 'dead') return { data: pageOfJobs([stopped], { queued: 0, running: 0, done: 1, dead: 1 }) };
      return { data: pageOfJobs([stopped, sent], { queued: 0, running: 0, done: 1, dead: 1 }) };
    });
    const post = vi.spyOn(apiClient, 'post').mockResolvedValue({ data: { ...stopped, state: 'queued', attempts: 0 } });
    renderWithApp(<BackgroundWorkPage />, { route: '/settings/background-work' });

    const list = await screen.findByRole('list', { name: 'Background work' });
    const rows = within(list).getAllByTestId('job-row');
    expect(rows).toHaveLength(2);
    expect(within(rows[0]).getByText(stopped.subject)).toBeInTheDocument();
    expect(within(rows[0]).getByText('Stopped')).toBeInTheDocument();
    expect(within(rows[0]).getByText(/Attempt 8 of 8/)).toBeInTheDocument();
    expect(within(rows[0]).getByText(stopped.lastError!)).toBeInTheDocument();
    expect(within(rows[0]).getByText(stopped.lastErrorDetail!)).toBeInTheDocument();
    // Only a stopped job can be tried again.
    expect(within(rows[1]).getByText('Done')).toBeInTheDocument();
    expect(within(rows[1]).queryByRole('button', { name: /Try again/ })).toBeNull();
    expect(screen.getByText('1 job stopped after its last attempt.')).toBeInTheDocument();

    await userEvent.click(within(rows[0]).getByRole('button', { name: `Try again: ${stopped.subject}` }));
    expect(await screen.findByText(/goes back in the queue now with 8 fresh attempts/)).toBeInTheDocument();
    const calls = get.mock.calls.length;
    await userEvent.click(screen.getByRole('button', { name: 'Try again' }));

    await waitFor(() => expect(post).toHaveBeenCalledWith('/jobs/job-quote-mail/retry'));
    expect(await screen.findByText('Queued again')).toBeInTheDocument();
    await waitFor(() => expect(get.mock.calls.length).toBeGreaterThan(calls));
  });

  it('filters by state with the counts in the labels, kept in the address', async () => {
    const get = vi.spyOn(apiClient, 'get').mockImplementation(async (_url, config) => {
      const state = (config?.params as { state?: string }).state;
      if (state === 'dead') return { data: pageOfJobs([], { queued: 2, running: 1, done: 14, dead: 0 }) };
      return { data: pageOfJobs([sent], { queued: 2, running: 1, done: 14, dead: 0 }) };
    });
    renderWithApp(<BackgroundWorkPage />, { route: '/settings/background-work' });

    await screen.findByRole('list', { name: 'Background work' });
    for (const label of ['All', 'Waiting (2)', 'Running (1)', 'Done (14)', 'Stopped (0)']) expect(screen.getByText(label)).toBeInTheDocument();
    await userEvent.click(screen.getByText('Stopped (0)'));
    expect(await screen.findByText(/Nothing stopped: every e-mail and payment event went through/)).toBeInTheDocument();
    expect(screen.getByTestId('location').textContent).toBe('/settings/background-work?state=dead');
    expect(get).toHaveBeenLastCalledWith('/jobs', expect.objectContaining({ params: { page: 1, pageSize: 20, state: 'dead' } }));
  });

  it('holds its self-refresh while a "Try again" confirmation is open, and takes it up again when it closes', async () => {
    // Work is waiting, so the list refreshes itself every JOBS_REFRESH_MS.
    const get = vi.spyOn(apiClient, 'get').mockResolvedValue({ data: pageOfJobs([stopped], { queued: 1, running: 0, done: 1, dead: 1 }) });
    renderWithApp(<BackgroundWorkPage />, { route: '/settings/background-work?state=dead' });
    await userEvent.click(await screen.findByRole('button', { name: `Try again: ${stopped.subject}` }));
    const question = await screen.findByText(/goes back in the queue now with 8 fresh attempts/);
    const calls = get.mock.calls.length;
    await new Promise((resolve) => setTimeout(resolve, JOBS_REFRESH_MS + 600));
    expect(get.mock.calls.length).toBe(calls);
    expect(question).toBeVisible();
    await userEvent.click(screen.getByRole('button', { name: 'Not now' }));
    await waitFor(() => expect(get.mock.calls.length).toBeGreaterThan(calls), { timeout: JOBS_REFRESH_MS + 2000 });
  });

  it('a self-refresh that fails keeps the list in view with a note, instead of swapping it for an error page', async () => {
    let calls = 0;
    vi.spyOn(apiClient, 'get').mockImplementation(async () => {
      calls += 1;
      if (calls === 1) return { data: pageOfJobs([stopped], { queued: 1, running: 0, done: 1, dead: 1 }) };
      throw new AxiosError('timeout of 20000ms exceeded', 'ECONNABORTED');
    });
    renderWithApp(<BackgroundWorkPage />, { route: '/settings/background-work?state=dead' });
    await screen.findByRole('list', { name: 'Background work' });
    expect(await screen.findByText(/could not be refreshed just now/, {}, { timeout: JOBS_REFRESH_MS + 2000 })).toBeInTheDocument();
    expect(within(screen.getByRole('list', { name: 'Background work' })).getAllByTestId('job-row')).toHaveLength(1);
    expect(screen.getByRole('button', { name: `Try again: ${stopped.subject}` })).toBeInTheDocument();
  });
});
