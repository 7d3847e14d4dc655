/** The daily log's own cache keys; the office's job screens keep theirs, so neither clears the other's. */
export const dailyLogKeys = {
  all: ['daily-log'] as const,
  job: (jobId: string) => [...dailyLogKeys.all, 'job', jobId] as const,
  crewJobs: (today: string) => [...dailyLogKeys.all, 'crew-jobs', today] as const,
  crews: () => [...dailyLogKeys.all, 'crews'] as const,
  /** The server's copy of a log in conflict, per save of this phone's copy. */
  storedLog: (logId: string, saveId: string) =>
    [...dailyLogKeys.all, 'stored-log', logId, saveId] as const,
};
