import { useState } from 'react';
import type { Paper } from '../types';

const KEY = 'railwright.templatePaper';

/** The paper last chosen for templates, kept in this browser (Letter in North America, A4 elsewhere). */
export function usePaper(): [Paper, (p: Paper) => void] {
  const [paper, setPaper] = useState<Paper>(() => (localStorage.getItem(KEY) === 'letter' ? 'letter' : 'a4'));
  return [
    paper,
    (p) => {
      localStorage.setItem(KEY, p);
      setPaper(p);
    },
  ];
}
