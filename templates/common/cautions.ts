/**
 * Cautions shared by the built-in templates. Where a number could be used to lift or clamp a
 * real load, the calculator shows these beside the results, always.
 */
export const DESIGN_AID =
  'This calculation is a design aid for a qualified person. It does not replace the design review, proof test, inspection and marking that the applicable standards and local regulations require.';

export const LIFTING_STANDARDS =
  'Below-the-hook lifting devices: rated load, design category and design factor, proof test, marking and periodic inspection follow the standards that apply where the device is used, for example ASME B30.20 with ASME BTH-1 in the USA or EN 13155 in Europe, and local regulations.';

export const IDEAL_MODEL =
  'The model is planar statics: rigid parts, frictionless pins unless stated, loads applied slowly. Dynamic effects (snatch, swing, impact), wear, tolerances and member deflection are not included.';

export const FRICTION_GRIP =
  'A friction grip holds only on clean, dry contact surfaces hard enough for the jaws. Oil, paint, ice, coatings or a harder load than assumed lower the friction sharply; design with the low end of the friction range or test data, never a handbook high value.';

export const CLAMPING =
  'Clamping forces near a toggle dead centre change strongly with small changes of geometry, wear and workpiece thickness: verify the clamping force on the real fixture and keep hands clear of the closing path.';

export const STRUCTURE =
  'Member, pin and weld strengths, buckling of compression members and the anchorage to the supporting structure must be checked separately against the applicable design code.';

export const LIFTING_CAUTIONS = [DESIGN_AID, LIFTING_STANDARDS, IDEAL_MODEL, STRUCTURE];
