import type { Request, Response } from 'express';
import { problemTypes } from '../../../shared/api/problem';
import type { UnitSystem } from '../../../shared/units/unit-systems';
import { HttpProblem } from '../../middleware/http-problem';
import { CHART_LAYOUT_REVISION } from './chart-renderer';
import type { ChartIdentity } from './chart-svg';

export const SVG_CONTENT_TYPE = 'image/svg+xml; charset=utf-8';

export type ChartFormat = 'json' | 'svg';

/**
 * JSON or a ready chart, by the Accept header (no header or a wildcard: JSON). Caches are told
 * the answer depends on Accept, whatever the outcome.
 */
export function chartFormat(req: Request, res: Response): ChartFormat {
  res.vary('Accept');
  const chosen = req.accepts(['application/json', 'image/svg+xml']);
  if (chosen === 'application/json') return 'json';
  if (chosen === 'image/svg+xml') return 'svg';
  throw new HttpProblem({
    type: problemTypes.notAcceptable,
    title: 'Not acceptable',
    status: 406,
    detail: `This endpoint answers application/json or image/svg+xml; the Accept header '${req.get('accept') ?? ''}' allows neither.`,
  });
}

/** What an SVG answer's ETag adds to the JSON one's request, so the two never share a tag. */
export const chartTagPart = (format: ChartFormat) => (format === 'svg' ? { format: 'svg', layout: CHART_LAYOUT_REVISION } : {});

interface VersionRow {
  row: { title: string; slug: string; semver: string; contentHash: string };
}

export const chartIdentity = (v: VersionRow, units: UnitSystem): ChartIdentity => ({
  title: v.row.title,
  slug: v.row.slug,
  version: v.row.semver,
  contentHash: v.row.contentHash,
  units,
});

export function sendSvg(res: Response, svg: string, filename: string): void {
  res.setHeader('Content-Type', SVG_CONTENT_TYPE);
  res.setHeader('Content-Disposition', `inline; filename="${filename.replace(/[^A-Za-z0-9._-]/g, '-')}"`);
  res.send(svg);
}
