/** Query keys of this feature; the area "rewrite" (and "coach") is dropped at sign-out like every other. */
export const rewriteKeys = {
  model: (requestSignature: string) => ['rewrite', 'model', requestSignature] as const,
  coachTargets: ['coach', 'mine', 'targets'] as const,
};
