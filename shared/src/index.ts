export * from './api/auth';
export * from './api/codes';
export * from './api/knowledge';
export * from './dtc/index';
export * from './vin/index';
export * from './money/index';
export * from './likelihood/index';
export * from './fixpath/index';
