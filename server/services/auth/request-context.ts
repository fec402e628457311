import { AsyncLocalStorage } from 'node:async_hooks';

/** What the auth library's hooks need to know about the HTTP request that runs them. */
export interface AuthRequestContext {
  ip: string | null;
}

export const authRequestContext = new AsyncLocalStorage<AuthRequestContext>();

export function currentIp(): string | null {
  return authRequestContext.getStore()?.ip ?? null;
}
