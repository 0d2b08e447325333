/**
 * Sign-in and registration get their own, much stricter bucket. The limit is read when
 * the request is handled, so the configured value (AUTH_THROTTLE_LIMIT) applies.
 */
export const AUTH_THROTTLE = {
  default: { limit: () => Number(process.env.AUTH_THROTTLE_LIMIT ?? 10), ttl: 60_000 },
};
