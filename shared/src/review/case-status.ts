/** Case statuses, in workflow order. The inspector moves open ↔ submitted; review states come from supervisors. */
export const CASE_STATUSES = ['open', 'submitted', 'in_review', 'accepted', 'returned'] as const;
export type CaseStatus = (typeof CASE_STATUSES)[number];
