/** Plain names of the record types evidence can be attached to. */
export const SUBJECT_TYPE_LABELS: Record<string, string> = {
  machine: 'Machine',
  rail: 'Rail',
  'rail-sweep': 'Rail sweep',
  'bolt-down': 'Bolt-down',
  axis: 'Axis',
  'travel-trial': 'Travel trial',
  'positioning-run': 'Repeat-and-reverse run',
  'backlash-check': 'Backlash check',
  'diagonal-check': 'Diagonal check',
  'bed-grid': 'Bed grid',
  'test-cut': 'Test cut',
  'safety-item': 'Safety walk item',
};

export const subjectTypeLabel = (type: string) => SUBJECT_TYPE_LABELS[type] ?? type.replace(/-/g, ' ');
