// jstat ships no type declarations; only what the tests use as a reference is declared.
declare module 'jstat' {
  export const jStat: {
    beta: {
      inv(p: number, alpha: number, beta: number): number;
      mean(alpha: number, beta: number): number;
    };
  };
}
