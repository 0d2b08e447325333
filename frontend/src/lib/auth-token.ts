import { useSyncExternalStore } from 'react';

export const TOKEN_STORAGE_KEY = 'causeway.token';

type Listener = () => void;
const listeners = new Set<Listener>();

function read(): string | null {
  try {
    return window.localStorage.getItem(TOKEN_STORAGE_KEY);
  } catch {
    // Storage can be blocked (private modes, strict settings); then nobody is signed in.
    return null;
  }
}

function emit(): void {
  for (const listener of listeners) listener();
}

// Signing out in one tab signs out the others.
function onStorage(event: StorageEvent): void {
  if (event.key === TOKEN_STORAGE_KEY || event.key === null) emit();
}

/** The bearer token of the signed-in user, kept in localStorage and observable. */
export const authToken = {
  get: read,
  set(token: string): void {
    window.localStorage.setItem(TOKEN_STORAGE_KEY, token);
    emit();
  },
  clear(): void {
    if (read() === null) return;
    window.localStorage.removeItem(TOKEN_STORAGE_KEY);
    emit();
  },
  subscribe(listener: Listener): () => void {
    if (listeners.size === 0) window.addEventListener('storage', onStorage);
    listeners.add(listener);
    return () => {
      listeners.delete(listener);
      if (listeners.size === 0) window.removeEventListener('storage', onStorage);
    };
  },
};

export function useAuthToken(): string | null {
  return useSyncExternalStore(authToken.subscribe, authToken.get, () => null);
}
