import { toggleClamp } from '../../templates/toggle-clamp/spec';

/** The documented example body of the spec endpoints: a built-in's spec, under a slug of its own. */
export const toggleExampleSpec = { ...toggleClamp, slug: 'my-toggle-clamp', title: 'My toggle clamp' };
