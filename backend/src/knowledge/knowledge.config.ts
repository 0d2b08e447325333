import { registerAs } from '@nestjs/config';

function positive(name: string, fallback: number): number {
  const raw = process.env[name];
  if (raw === undefined || raw === '') return fallback;
  const value = Number(raw);
  // A bad cap must stop the boot, naming the variable, like every other setting.
  if (!Number.isFinite(value) || value <= 0) throw new Error(`Invalid environment:\n${name}: must be a number > 0`);
  return value;
}

/**
 * How far one contributor can move a likelihood (product.md §2): the most total outcome
 * weight one user / one shop may add to one (code, vehicle scope) posterior.
 */
export const knowledgeConfig = registerAs('knowledge', () => ({
  influenceCapUser: positive('INFLUENCE_CAP_USER', 3),
  influenceCapShop: positive('INFLUENCE_CAP_SHOP', 10),
}));

export type KnowledgeConfig = ReturnType<typeof knowledgeConfig>;
