import { screen } from '@testing-library/react';
import { describe, expect, it, vi } from 'vitest';
import { apiClient } from '@/lib/api-client';
import { renderWithApp } from '@/test/render';
import { StoppedWorkNotice } from '../stopped-work-notice';

const page = (dead: number) => ({ items: [], total: dead, page: 1, pageSize: 1, counts: { queued: 0, running: 0, done: 3, dead } });

describe('StoppedWorkNotice', () => {
  it('names how many stopped and links to them', async () => {
    vi.spyOn(apiClient, 'get').mockResolvedValue({ data: page(2) });
    renderWithApp(<StoppedWorkNotice to="/settings/background-work?state=dead" />);
    expect(await screen.findByText('2 e-mails or payment events stopped after their last attempt.')).toBeInTheDocument();
    expect(screen.getByRole('link', { name: 'Background work' }).getAttribute('href')).toBe('/settings/background-work?state=dead');
  });

  it('says nothing when nothing stopped', async () => {
    const get = vi.spyOn(apiClient, 'get').mockResolvedValue({ data: page(0) });
    const { container } = renderWithApp(<StoppedWorkNotice to="/settings/background-work?state=dead" />);
    await vi.waitFor(() => expect(get).toHaveBeenCalledWith('/jobs', expect.objectContaining({ params: { page: 1, pageSize: 1, state: 'dead' } })));
    expect(container.querySelector('.ant-alert')).toBeNull();
  });
});
