import type { TemplateSummary } from '../api/get-templates';

export type Category = TemplateSummary['category'];

const labels: Record<Category, string> = {
  lifting: 'Lifting devices',
  workholding: 'Workholding',
  frames: 'Frames and jibs',
  linkages: 'Linkages',
  machines: 'Machines',
};

export function categoryLabel(category: Category): string {
  return labels[category];
}
