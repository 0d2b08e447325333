import type { UserDto } from '@causeway/shared';
import { createContext, useContext, type ReactNode } from 'react';

/** The query key of `GET /api/me`; everything that changes the signed-in user updates it. */
export const CURRENT_USER_QUERY_KEY = ['me'] as const;

const CurrentUserContext = createContext<UserDto | null>(null);

interface CurrentUserProviderProps {
  user: UserDto;
  children: ReactNode;
}

/** Provided by the signed-in part of the app once the user is known. */
export function CurrentUserProvider({ user, children }: CurrentUserProviderProps) {
  return <CurrentUserContext.Provider value={user}>{children}</CurrentUserContext.Provider>;
}

/** The signed-in user; only inside the signed-in part of the app. */
export function useCurrentUser(): UserDto {
  const user = useContext(CurrentUserContext);
  if (!user) throw new Error('useCurrentUser is only available inside the signed-in part of the app');
  return user;
}
