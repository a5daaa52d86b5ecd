/** Routes of the escalations tab. */
export const escalationPaths = {
  inbox: '/tabs/escalations',
  escalation: (id: string) => `/tabs/escalations/${encodeURIComponent(id)}`,
};
