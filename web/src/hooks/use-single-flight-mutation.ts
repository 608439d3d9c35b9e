import { useMutation, type DefaultError, type MutateOptions, type UseMutationOptions, type UseMutationResult } from '@tanstack/react-query';
import { useCallback, useRef } from 'react';

const fileIds = new WeakMap<object, number>();
let nextFileId = 0;

/** The same request twice gives the same key; a file or blob counts by identity (two different photos never match). */
export function flightKey(variables: unknown): string {
  if (variables === undefined) return 'undefined';
  return JSON.stringify(variables, (_key, value: unknown) => {
    if (typeof Blob !== 'undefined' && value instanceof Blob) {
      if (!fileIds.has(value)) fileIds.set(value, ++nextFileId);
      return `blob#${fileIds.get(value)}`;
    }
    return value;
  });
}

/** Settles never: the duplicate caller stops where it awaited, as if its handler had returned early. */
const stopHere = <T>() => new Promise<T>(() => undefined);

/**
 * `useMutation` that sends a request only once while the same request is in flight. A double-click fires the click
 * handler (and a form's onFinish) twice before React re-renders with `isPending`, so the button's `loading` alone
 * does not stop the second request: here the second call with the same variables is dropped at once (synchronously)
 * and sends nothing, shows no second toast and runs no second callback. A call with other variables (another row's
 * button) still goes out. Pair it with `loading={mutation.isPending}` on the button so the person sees it working.
 */
export function useSingleFlightMutation<TData = unknown, TError = DefaultError, TVariables = void, TOnMutateResult = unknown>(
  options: UseMutationOptions<TData, TError, TVariables, TOnMutateResult>,
): UseMutationResult<TData, TError, TVariables, TOnMutateResult> {
  const mutation = useMutation(options);
  const inFlight = useRef(new Set<string>());
  const { mutateAsync: send } = mutation;

  const mutateAsync = useCallback(
    (variables: TVariables, callOptions?: MutateOptions<TData, TError, TVariables, TOnMutateResult>): Promise<TData> => {
      const key = flightKey(variables);
      if (inFlight.current.has(key)) return stopHere<TData>();
      inFlight.current.add(key);
      return send(variables, callOptions).finally(() => inFlight.current.delete(key));
    },
    [send],
  ) as UseMutationResult<TData, TError, TVariables, TOnMutateResult>['mutateAsync'];

  const mutate = useCallback(
    (variables: TVariables, callOptions?: MutateOptions<TData, TError, TVariables, TOnMutateResult>) => {
      (mutateAsync as (v: TVariables, o?: typeof callOptions) => Promise<TData>)(variables, callOptions).catch(() => undefined);
    },
    [mutateAsync],
  ) as UseMutationResult<TData, TError, TVariables, TOnMutateResult>['mutate'];

  return { ...mutation, mutate, mutateAsync };
}
