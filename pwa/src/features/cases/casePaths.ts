/** The Cases tab's routes (detail routes nested under the tab, so it keeps its own history). */
export const casePaths = {
  list: '/tabs/cases',
  create: '/tabs/cases/new',
  case: (id: string) => `/tabs/cases/${id}`,
  edit: (id: string) => `/tabs/cases/${id}/edit`,
  newSample: (caseId: string) => `/tabs/cases/${caseId}/samples/new`,
  sample: (caseId: string, sampleId: string) => `/tabs/cases/${caseId}/samples/${sampleId}`,
};
