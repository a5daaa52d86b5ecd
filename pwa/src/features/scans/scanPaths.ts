/** A sample's scan routes, nested under the Cases tab so the tab keeps its own history. */
export const scanPaths = {
  newScan: (caseId: string, sampleId: string) => `/tabs/cases/${caseId}/samples/${sampleId}/scans/new`,
  scan: (caseId: string, sampleId: string, scanId: string) => `/tabs/cases/${caseId}/samples/${sampleId}/scans/${scanId}`,
};

/** The route parameter that opens the scan screen instead of a saved scan. */
export const NEW_SCAN = 'new';
