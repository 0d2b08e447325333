export { betaInterval, DEFAULT_CREDIBLE_LEVEL } from './beta';
export { LikelihoodInputError } from './errors';
export type { LikelihoodIssue } from './errors';
export { backoffPosterior, dirichletPosterior, UNLISTED_KEY } from './posterior';
export type { BackoffLevel, BackoffResult, CauseLikelihood, PosteriorResult, PriorCause } from './posterior';
export { capInfluence } from './influence';
export type { CappedCounts, InfluenceCaps, OutcomeCredit } from './influence';
export { conditionOnExcluded, fractionalCredit } from './conditioning';
export type { ConditionedLikelihoods, KeyedProbability } from './conditioning';
