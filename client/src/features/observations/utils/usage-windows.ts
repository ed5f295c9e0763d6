/** The chart windows offered on the PCA page, in hours. */
export const USAGE_WINDOWS = [8, 12, 24] as const;
export type UsageWindow = (typeof USAGE_WINDOWS)[number];
