import { registerAs } from '@nestjs/config';

/** Days a staged-estimate link stays open unless the request says otherwise (ESTIMATE_EXPIRY_DAYS, default 14). */
export const estimatesConfig = registerAs('estimates', () => {
  const raw = process.env.ESTIMATE_EXPIRY_DAYS;
  const days = raw === undefined || raw === '' ? 14 : Number(raw);
  // A bad value stops the boot naming the variable, like every other setting.
  if (!Number.isInteger(days) || days < 1 || days > 365) throw new Error('Invalid environment:\nESTIMATE_EXPIRY_DAYS: must be a whole number of days from 1 to 365');
  return { expiryDays: days };
});

export type EstimatesConfig = ReturnType<typeof estimatesConfig>;
