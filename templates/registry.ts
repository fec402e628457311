import type { TemplateSpecInput } from '../shared/spec/template-spec';
import { aFrameCrossbar } from './a-frame-crossbar/spec';
import { compoundLeverCutter } from './compound-lever-cutter/spec';
import { fourBarLinkage } from './four-bar-linkage/spec';
import { plateLiftingClamp } from './plate-lifting-clamp/spec';
import { scissorLiftTable } from './scissor-lift-table/spec';
import { scissorLiftingTongs } from './scissor-lifting-tongs/spec';
import { shopCrane } from './shop-crane/spec';
import { toggleClamp } from './toggle-clamp/spec';
import { twoLegBridle } from './two-leg-bridle/spec';
import { wallJibTieRod } from './wall-jib-tie-rod/spec';

/**
 * The built-in templates, in the order the library shows them. Seeding stores each as a
 * published version; a changed spec here becomes a new version, never an overwrite.
 */
export const builtInTemplates: TemplateSpecInput[] = [scissorLiftingTongs, toggleClamp, aFrameCrossbar, wallJibTieRod, compoundLeverCutter, scissorLiftTable, twoLegBridle, shopCrane, fourBarLinkage, plateLiftingClamp];
