/** Every route path of the app, so links are never typed twice. */
export const paths = {
  signIn: '/sign-in',
  home: '/',
  machines: '/machines',
  machine: (id: string) => `/machines/${id}`,
  rail: (machineId: string, railId: string) => `/machines/${machineId}/rails/${railId}`,
  boltDown: (machineId: string, railId: string) => `/machines/${machineId}/rails/${railId}/bolt-down`,
  axis: (machineId: string, axisId: string) => `/machines/${machineId}/axes/${axisId}`,
  holePattern: (machineId: string, patternId: string) => `/machines/${machineId}/templates/${patternId}`,
  calculators: '/calculators',
  targetSets: '/target-sets',
  people: '/people',
  setPassword: '/set-password',
  forgotPassword: '/forgot-password',
  outbox: '/outbox',
  activity: '/activity',
  verify: (token: string) => `/verify/${token}`,
} as const;
