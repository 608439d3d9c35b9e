import { screen } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { renderWithApp } from '@/test/render';
import type { Project } from '../../types';
import { ProjectSelectionsCard } from '../project-details';

const project = {
  id: 'p1',
  vehicleDescription: 'Long-bed pickup',
  chassisModelId: 'ch-1',
  engineProfileId: 'en-1',
  transmissionId: null,
} as Project;

describe('ProjectSelectionsCard', () => {
  it('shows catalog names and links to the fit page', () => {
    renderWithApp(<ProjectSelectionsCard project={project} names={{ chassis: 'Short-cab frame', engine: 'Aluminium V8' }} fitPath="/projects/p1/fit" />);
    expect(screen.getByText('Short-cab frame')).toBeInTheDocument();
    expect(screen.getByText('Aluminium V8')).toBeInTheDocument();
    expect(screen.queryByText('ch-1')).toBeNull();
    expect(screen.getByText('No transmission chosen yet')).toBeInTheDocument();
    expect(screen.getByRole('link', { name: 'Choose parts on the fit page' }).getAttribute('href')).toBe('/projects/p1/fit');
    expect(screen.queryByText(/arrives with the catalog/)).toBeNull();
  });

  it('says "chosen by the shop" when the name is not known to the viewer', () => {
    renderWithApp(<ProjectSelectionsCard project={project} unnamedLabel="Chosen by the shop" />);
    expect(screen.getAllByText('Chosen by the shop')).toHaveLength(2);
    expect(screen.queryByText('en-1')).toBeNull();
  });

  it('while the names load shows a placeholder, never the record id', () => {
    renderWithApp(<ProjectSelectionsCard project={project} nameStates={{ chassis: 'loading', engine: 'loading' }} />);
    expect(screen.getByRole('status', { name: "Loading the chassis model's name" })).toBeInTheDocument();
    expect(screen.getByRole('status', { name: "Loading the engine's name" })).toBeInTheDocument();
    expect(screen.queryByText('ch-1')).toBeNull();
    expect(screen.queryByText('en-1')).toBeNull();
  });

  it('without a name or a reason still shows no id', () => {
    renderWithApp(<ProjectSelectionsCard project={project} />);
    expect(screen.getAllByTestId('part-name-loading')).toHaveLength(2);
    expect(screen.queryByText('ch-1')).toBeNull();
  });

  it('says a record removed from the catalog is gone, and one not readable now could not be loaded', () => {
    renderWithApp(<ProjectSelectionsCard project={project} names={{ engine: 'Aluminium V8' }} nameStates={{ chassis: 'gone', engine: 'loading' }} />);
    expect(screen.getByText('Not in the catalog any more')).toBeInTheDocument();
    // a name already known wins over a refetch in flight
    expect(screen.getByText('Aluminium V8')).toBeInTheDocument();
    expect(screen.queryByTestId('part-name-loading')).toBeNull();
  });

  it('says when a name could not be read just now', () => {
    renderWithApp(<ProjectSelectionsCard project={project} nameStates={{ chassis: 'unavailable', engine: 'gone' }} />);
    expect(screen.getByText(/could not be loaded/)).toBeInTheDocument();
    expect(screen.queryByText('ch-1')).toBeNull();
  });
});
