import { screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it, vi } from 'vitest';
import { renderWithApp } from '@/test/render';
import { FilterStrip } from '../filter-strip';

const OPTIONS = [
  { value: 'all', label: 'All' },
  { value: 'ready', label: 'Ready for the bay' },
  { value: 'in-the-bay', label: 'In the bay' },
  { value: 'finished', label: 'Finished' },
];

describe('FilterStrip', () => {
  it('keeps every choice in sight: the strip wraps its choices instead of scrolling them out of its box', async () => {
    const onChange = vi.fn();
    renderWithApp(<FilterStrip label="Work order state" options={OPTIONS} value="all" onChange={onChange} />);
    const strip = screen.getByLabelText('Work order state');
    expect(strip).toHaveClass('filter-strip');
    // no scrolling box around it any more: a hidden choice had no sign that it was there
    expect(strip.parentElement).not.toHaveStyle({ overflowX: 'auto' });
    for (const option of OPTIONS) expect(screen.getByText(option.label)).toBeVisible();
    // global.css lets the choices wrap (jsdom applies no stylesheet, so the rule itself is checked)
    const css = readFileSync(join(__dirname, '..', '..', 'app', 'global.css'), 'utf8');
    expect(css).toMatch(/\.filter-strip \.ant-segmented-group \{\s*flex-wrap: wrap;/);

    await userEvent.click(screen.getByText('Finished'));
    expect(onChange).toHaveBeenCalledWith('finished');
  });
});
