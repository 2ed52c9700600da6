/** The kinds a reader may filter by, in the server's plain words. */
export const MACHINE_HISTORY_KINDS: [string, string][] = [
  ['machine', 'Machine'],
  ['rail', 'Rail'],
  ['rail-sweep', 'Rail sweep'],
  ['bolt-down', 'Bolt-down'],
  ['axis', 'Axis'],
  ['travel-trial', 'Travel trial'],
  ['positioning-run', 'Positioning run'],
  ['backlash-check', 'Backlash check'],
  ['diagonal-check', 'Squareness check'],
  ['bed-grid', 'Bed flatness'],
  ['test-cut', 'Test cut'],
  ['safety-walk', 'Safety walk'],
  ['waiver', 'Waiver'],
  ['approval', 'Approval'],
  ['evidence', 'Photo or file'],
];

export const WORKSHOP_HISTORY_KINDS: [string, string][] = [
  ['person', 'Person'],
  ['password', 'Password'],
  ['sign-in', 'Sign-in'],
  ['target-set', 'Target set'],
  ['safety-item', 'Safety-walk item'],
  ...MACHINE_HISTORY_KINDS,
];
