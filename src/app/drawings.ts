import type { DrawingSpec } from '../../shared/drawing/spec-geometry';
import type { SolveResult } from '../../shared/mechanics/solve-result';
import type { UnitSystem } from '../../shared/units/unit-systems';

type FreeBodyDrawing = (spec: DrawingSpec, result: SolveResult, partId: string, options: { unitSystem: UnitSystem; idPrefix?: string }) => string;

/** The free-body drawing of one part (shared/drawing), or null until that module exists. */
export const freeBodyDrawing: FreeBodyDrawing | null = null;
