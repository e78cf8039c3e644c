/**
 * Tries per client address on the routes a guesser or a spammer would use, window in seconds. Tight
 * enough that guessing a password or flooding someone's inbox goes nowhere, loose enough that a person
 * who mistypes a few times, or an owner inviting a class, is never stopped (common practice).
 */
export const AUTH_RATE_LIMITS = {
  "/sign-in/email": { window: 60, max: 5 },
  "/sign-up/email": { window: 3600, max: 10 },
  "/request-password-reset": { window: 3600, max: 5 },
  "/reset-password": { window: 600, max: 10 },
  "/organization/invite-member": { window: 3600, max: 60 },
} as const;
