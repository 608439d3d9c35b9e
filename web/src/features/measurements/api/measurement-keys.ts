export const measurementKeys = {
  all: ['measurements'] as const,
  sheets: () => [...measurementKeys.all, 'sheet'] as const,
  sheet: (projectId: string) => [...measurementKeys.sheets(), projectId] as const,
  photoFile: (photoId: string) => [...measurementKeys.all, 'photo-file', photoId] as const,
  template: (chassisId: string) => [...measurementKeys.all, 'template', chassisId] as const,
  settings: () => [...measurementKeys.all, 'settings'] as const,
};
