import type { MeResponse } from '../../shared/api/auth';
import { useMe } from '../features/auth/api/get-me';

/** The signed-in person, for pages below RequireAccess (which renders them only once this is known). */
export function useSignedIn(): MeResponse {
  const me = useMe();
  if (!me.data) throw new Error('useSignedIn used outside RequireAccess');
  return me.data;
}
