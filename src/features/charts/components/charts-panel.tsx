import type { UnitSystem } from '../../../../shared/units/unit-systems';
import { SweepChart, type ChartInput, type ChartResult } from './sweep-chart';
import { TornadoChart } from './tornado-chart';

export interface ChartsPanelProps {
  slug: string;
  version: string;
  /** Engine units, the values of the last settled solve. */
  inputs: Record<string, number>;
  system: UnitSystem;
  specInputs: ChartInput[];
  results: ChartResult[];
}

/** Loaded on its own (Recharts is large), after the calculator itself is on screen. */
export default function ChartsPanel(props: ChartsPanelProps) {
  return (
    <div className="grid gap-10">
      <SweepChart {...props} />
      <TornadoChart slug={props.slug} version={props.version} inputs={props.inputs} system={props.system} results={props.results} />
    </div>
  );
}
