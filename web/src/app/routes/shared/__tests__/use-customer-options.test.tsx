import { QueryClientProvider } from '@tanstack/react-query';
import { renderHook, waitFor } from '@testing-library/react';
import type { ReactNode } from 'react';
import { describe, expect, it, vi } from 'vitest';
import { apiClient } from '@/lib/api-client';
import { customerStubs, pageOf } from '@/test/fixtures';
import { createTestQueryClient } from '@/test/render';
import { useCustomerOptions } from '../use-customer-options';

const own = { ...customerStubs[0], id: 'cust-own', name: 'Wren Halloway', userId: 'user-me', ownRecord: true };

function wrapper({ children }: { children: ReactNode }) {
  return <QueryClientProvider client={createTestQueryClient()}>{children}</QueryClientProvider>;
}

describe('useCustomerOptions', () => {
  it("names the member's own record as themselves in a customer picker", async () => {
    vi.spyOn(apiClient, 'get').mockResolvedValue({ data: pageOf([own, ...customerStubs]) });
    const { result } = renderHook(() => useCustomerOptions(), { wrapper });
    await waitFor(() => expect(result.current.options).toHaveLength(3));
    expect(result.current.options.map((o) => o.label)).toEqual(['Wren Halloway (you)', 'Marlo Penhallow', 'Tove Quillfeather']);
  });

  it('leaves it out where it makes no sense, such as inviting someone to follow their projects', async () => {
    vi.spyOn(apiClient, 'get').mockResolvedValue({ data: pageOf([own, ...customerStubs]) });
    const { result } = renderHook(() => useCustomerOptions({ withoutOwnRecord: true }), { wrapper });
    await waitFor(() => expect(result.current.options).toHaveLength(2));
    expect(result.current.options.map((o) => o.value)).toEqual(['cust-1', 'cust-2']);
  });
});
