import useSWRMutation from 'swr/mutation';

import { apiSend, type ApiError } from '@/lib/api/fetcher';
import { keys } from '@/lib/api/keys';
import { builtSystemSchema, type BuiltSystem, type SystemRequest } from '@/shared/constants';

/**
 * Builds a problem from the library for the chosen ions (POST /api/systems/build): the engine's input,
 * the constant versions behind it and the solids the ions can form. A mutation, not a cached read:
 * every press of Calculate asks again so a value approved a moment ago is used.
 */
export function useBuildSystem() {
  return useSWRMutation<BuiltSystem, ApiError, string, SystemRequest>(keys.buildSystem, (path, { arg }) =>
    apiSend('POST', path, builtSystemSchema, arg),
  );
}
