/** The supervisor's review tab: the queue, and each case's review page under it (one navigation stack). */
export const reviewPaths = {
  queue: '/tabs/review',
  case: (caseId: string) => `/tabs/review/cases/${encodeURIComponent(caseId)}`,
};
