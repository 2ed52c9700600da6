import type { Paper } from '../types';

/** Template files are plain links: the browser opens the PDF in its viewer to print from. */
export const patternTemplateUrl = (id: string, format: 'pdf' | 'svg', paper: Paper = 'a4') =>
  format === 'pdf' ? `/api/hole-patterns/${id}/template.pdf?paper=${paper}` : `/api/hole-patterns/${id}/template.svg`;

export const railTemplateUrl = (id: string, format: 'pdf' | 'svg', paper: Paper = 'a4') =>
  format === 'pdf' ? `/api/rails/${id}/template.pdf?paper=${paper}` : `/api/rails/${id}/template.svg`;
