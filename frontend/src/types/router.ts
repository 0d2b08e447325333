import type { ComponentType } from 'react';
import type { Location } from 'react-router-dom';

/** What a lazily loaded route module exports. */
export interface RouteModule {
  Component: ComponentType;
}

/** The router state handed to the sign-in page: where to go back to afterwards. */
export interface SignInState {
  from?: Location;
}
