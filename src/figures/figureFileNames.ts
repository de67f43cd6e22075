/**
 * The names of figure files, one scheme for `firnline run --figures` and the browser's export:
 * the command line writes "<name>.svg" into its output folder; the browser saves
 * "<scenario file name>_<name>.<svg|png|pdf>", since downloads share one folder.
 */
export const FIGURE_FILE_NAMES = {
  /** The long profile at one model year. */
  profile: (year: number) => `profile-year-${year}`,
  /** The long profile at every `every` years (snapshotYears.ts). */
  snapshots: (every: number) => `profile-snapshots-every-${every}a`,
  /** Surface and sliding speed and driving stress at one model year. */
  alongFlow: (year: number) => `along-flow-year-${year}`,
  /** Length, volume, ELA and warming through time. */
  timeSeries: 'time-series',
} as const;
