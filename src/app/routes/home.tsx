import { Link } from 'react-router-dom';
import { HealthPanel } from '../../features/health/components/health-panel';
import { SafetyNote } from '../../components/safety-note';
import { TongSketch } from '../../components/tong-sketch';

const audiences = [
  {
    who: 'Engineers',
    what:
      'Write an analysis once as a template: typed inputs with units and bounds, the geometry, parts, pins and two-force members, the results and the design checks. Version it, cite its reference cases, and stop redoing the same sums for every size in a range.',
  },
  {
    who: 'Visitors',
    what:
      'Change the dimensions and the load and read the force in every pin, link and jaw, with each part’s free-body diagram, the checks that pass or fail, and the equilibrium residuals that show the numbers close.',
  },
  {
    who: 'Suppliers',
    what:
      'Put a calculator for your own product on your own website, so a customer can size a clamp or a lifter from published, versioned numbers without waiting for a call back.',
  },
];

export function HomeRoute() {
  return (
    <>
      <title>Pinwork · statics templates for lifting, workholding and frames</title>
      <section className="border-b border-paper-300 bg-paper-50">
        <div className="mx-auto grid max-w-page items-center gap-10 px-4 py-12 sm:px-6 md:grid-cols-[1.3fr_1fr] md:py-16">
          <div>
            <p className="text-sm font-bold tracking-wide text-signal-700 uppercase">
              Lifting devices · clamps · light frames
            </p>
            <h1 className="mt-3 text-4xl leading-tight font-extrabold tracking-tight text-ink-950 sm:text-5xl">
              Know the force in every pin, link and jaw.
            </h1>
            <p className="mt-5 max-w-xl text-lg leading-relaxed text-ink-800">
              Pinwork turns a hand statics analysis — a free-body diagram per member, equilibrium at
              every joint — into a template you can solve for every size and every load. Each
              solve is checked, each template is versioned, and the results can be handed to
              people who are not engineers.
            </p>
            <div className="mt-7 flex flex-wrap gap-3">
              <Link
                to="/how-it-works"
                className="rounded-lg bg-ink-800 px-5 py-3 text-sm font-bold text-paper-50 hover:bg-ink-700"
              >
                How a solve works
              </Link>
              <Link
                to="/templates"
                className="rounded-lg border border-ink-300 px-5 py-3 text-sm font-bold text-ink-800 hover:bg-ink-50"
              >
                Open the template library
              </Link>
            </div>
          </div>
          <TongSketch className="mx-auto w-full max-w-[16rem] md:max-w-sm" />
        </div>
      </section>

      <div className="mx-auto grid max-w-page gap-10 px-4 py-12 sm:px-6 lg:grid-cols-[2fr_1fr]">
        <section aria-labelledby="audiences-heading">
          <h2 id="audiences-heading" className="text-2xl font-extrabold tracking-tight text-ink-950">
            Who it is for
          </h2>
          <ul className="mt-5 grid gap-4 sm:grid-cols-3 lg:grid-cols-1 xl:grid-cols-3">
            {audiences.map((a) => (
              <li key={a.who} className="rounded-xl border border-ink-100 bg-paper-50 p-5">
                <h3 className="text-lg font-bold text-ink-900">{a.who}</h3>
                <p className="mt-2 text-sm leading-relaxed text-ink-800">{a.what}</p>
              </li>
            ))}
          </ul>
          <p className="mt-5 text-sm text-ink-700">
            This is an early build: the template library and its calculators are open; supplier
            embeds are being built now. The status panel shows what is running today.
          </p>
        </section>
        <div className="flex flex-col gap-6">
          <HealthPanel />
          <SafetyNote />
        </div>
      </div>
    </>
  );
}
