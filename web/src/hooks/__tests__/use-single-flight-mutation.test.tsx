import { QueryClientProvider } from '@tanstack/react-query';
import { act, renderHook } from '@testing-library/react';
import type { ReactNode } from 'react';
import { describe, expect, it, vi } from 'vitest';
import { createTestQueryClient } from '@/test/render';
import { flightKey, useSingleFlightMutation } from '../use-single-flight-mutation';

function setUp() {
  const answers: Array<(value: string) => void> = [];
  const send = vi.fn((_id: string) => new Promise<string>((r) => answers.push(r)));
  const onSuccess = vi.fn();
  const client = createTestQueryClient();
  const wrapper = ({ children }: { children: ReactNode }) => <QueryClientProvider client={client}>{children}</QueryClientProvider>;
  const { result } = renderHook(() => useSingleFlightMutation({ mutationFn: send, onSuccess }), { wrapper });
  return { result, send, onSuccess, answers };
}

describe('useSingleFlightMutation', () => {
  it('drops the same request while it is in flight, lets another row’s request through, and sends again once settled', async () => {
    const { result, send, onSuccess, answers } = setUp();
    await act(async () => {
      result.current.mutate('line-1');
      result.current.mutate('line-1');
      result.current.mutate('line-2');
      await new Promise((r) => setTimeout(r, 0));
    });
    expect(send.mock.calls.map(([id]) => id)).toEqual(['line-1', 'line-2']);

    await act(async () => {
      answers.forEach((answer) => answer('ok'));
      await new Promise((r) => setTimeout(r, 0));
    });
    expect(onSuccess).toHaveBeenCalledTimes(2);

    await act(async () => {
      result.current.mutate('line-1');
      await new Promise((r) => setTimeout(r, 0));
    });
    expect(send).toHaveBeenCalledTimes(3);
  });

  it('runs a duplicate mutateAsync caller no further, so its follow-up (a toast, closing a drawer) happens once', async () => {
    const { result, answers } = setUp();
    const after = vi.fn();
    await act(async () => {
      void result.current.mutateAsync('sheet-1').then(after);
      void result.current.mutateAsync('sheet-1').then(after);
      await new Promise((r) => setTimeout(r, 0));
    });
    expect(answers).toHaveLength(1);
    await act(async () => {
      answers[0]('ok');
      await new Promise((r) => setTimeout(r, 0));
    });
    expect(after).toHaveBeenCalledTimes(1);
  });

  it('tells two different photos apart and the same form values alike', () => {
    const a = new Blob(['a']);
    const b = new Blob(['a']);
    expect(flightKey({ file: a })).not.toBe(flightKey({ file: b }));
    expect(flightKey({ file: a })).toBe(flightKey({ file: a }));
    expect(flightKey({ name: 'x', n: 1 })).toBe(flightKey({ name: 'x', n: 1 }));
    expect(flightKey(undefined)).toBe('undefined');
  });
});
