import { Page } from '../../components/page';
import { SafetyNote } from '../../components/safety-note';

const steps = [
  {
    name: 'Inputs',
    text: 'Each template declares its inputs with a quantity, a default, bounds and help text. Values are checked before anything is solved, and a bad value is named with the reason. Internally everything is SI: newtons, millimetres, kilograms; angles in degrees at the edge only.',
  },
  {
    name: 'Derived values',
    text: 'Named expressions over the inputs — a weight from a mass, a half-width from a width — evaluated in a closed scope that cannot reach anything outside the template.',
  },
  {
    name: 'Geometry',
    text: 'Points are built in order: fixed coordinates, offsets, a point at given distances from two others, mirror images, intersections. A shape that cannot close says which point failed and by how much.',
  },
  {
    name: 'Statics',
    text: 'Rigid parts, two-force members, pins, rollers, contacts with friction, and loads of known or unknown size. Three equilibrium equations per part are assembled and solved; a structure that is indeterminate, not in equilibrium, or at dead centre is reported as such instead of printing a huge number.',
  },
  {
    name: 'Results and checks',
    text: 'Member forces (tension positive), joint resultants, mechanical advantage, required friction, pin shear stress — and checks with a pass, warn or fail verdict and advice.',
  },
  {
    name: 'Verification',
    text: 'Every solve returns the residual of every equilibrium equation and the global balance of loads and reactions, and, where a template names a driving coordinate, a virtual-work cross-check of its mechanical advantage.',
  },
];

export function HowItWorksRoute() {
  return (
    <Page
      title="How it works"
      lead="A template is a parametric mechanism with one statics engine behind it. The same engine runs on the server, in the browser while a template is written, and in the tests."
    >
      <ol className="grid gap-4 md:grid-cols-2">
        {steps.map((step, index) => (
          <li key={step.name} className="flex gap-4 rounded-xl border border-ink-100 bg-paper-50 p-5">
            <span
              aria-hidden="true"
              className="flex size-9 shrink-0 items-center justify-center rounded-full bg-ink-800 text-sm font-extrabold text-paper-50"
            >
              {index + 1}
            </span>
            <div>
              <h2 className="text-lg font-bold text-ink-900">{step.name}</h2>
              <p className="mt-1 text-sm leading-relaxed text-ink-800">{step.text}</p>
            </div>
          </li>
        ))}
      </ol>
      <div className="mt-8 max-w-3xl">
        <SafetyNote />
      </div>
    </Page>
  );
}
