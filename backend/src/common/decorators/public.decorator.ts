import { SetMetadata } from '@nestjs/common';

export const IS_PUBLIC_KEY = 'isPublic';
/** Marks a route that needs no token. Every other route is guarded. */
export const Public = () => SetMetadata(IS_PUBLIC_KEY, true);
