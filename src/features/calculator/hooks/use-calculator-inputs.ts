import { useCallback, useMemo } from 'react';
import { useSearchParams } from 'react-router-dom';
import type { InputDef } from '../../../../shared/spec/template-spec';
import { toDisplay, type UnitSystem } from '../../../../shared/units/unit-systems';
import { formatPlain } from '../../../lib/units/format-number';
import { isUnitSystem, rememberUnitSystem, storedUnitSystem } from '../../../lib/units/unit-preference';
import { toEngineValues, type FormValues } from '../form/engine-units-validator';

function parseParam(raw: string | null, fallback: number): number | string | undefined {
  if (raw === null) return fallback;
  if (raw.trim() === '') return undefined;
  const n = Number(raw);
  return Number.isFinite(n) ? n : raw;
}

/**
 * The calculation's state lives in the URL, so a copied link reproduces it: each input in
 * engine units (`?L=4000&m=2000`), and the unit system it is shown in (`&units=US`). A missing
 * input takes the version's default; the unit system falls back to the visitor's last choice.
 */
export function useCalculatorInputs(inputs: readonly InputDef[], defaults: Record<string, number>) {
  const [params, setParams] = useSearchParams();
  const unitsParam = params.get('units');
  const system: UnitSystem = isUnitSystem(unitsParam) ? unitsParam : storedUnitSystem();

  const engine: FormValues = useMemo(() => {
    const out: FormValues = {};
    for (const input of inputs) out[input.key] = parseParam(params.get(input.key), defaults[input.key] ?? input.default);
    return out;
  }, [inputs, defaults, params]);

  const display: FormValues = useMemo(() => {
    const out: FormValues = {};
    for (const input of inputs) {
      const v = engine[input.key];
      out[input.key] = typeof v === 'number' ? toDisplay(v, input.quantity, system) : v;
    }
    return out;
  }, [engine, inputs, system]);

  const write = useCallback(
    (next: FormValues | null, nextSystem: UnitSystem) => {
      setParams(
        (current) => {
          const out = new URLSearchParams(current);
          for (const input of inputs) {
            if (next === null) out.delete(input.key);
            else {
              const v = next[input.key];
              out.set(input.key, typeof v === 'number' ? formatPlain(v) : (v ?? ''));
            }
          }
          out.set('units', nextSystem);
          return out;
        },
        { replace: true },
      );
    },
    [inputs, setParams],
  );

  const setDisplayValues = useCallback(
    (values: FormValues) => write(toEngineValues(values, inputs, system), system),
    [write, inputs, system],
  );

  const setSystem = useCallback(
    (nextSystem: UnitSystem) => {
      rememberUnitSystem(nextSystem);
      // Engine values are unchanged by a unit switch: only the way they are shown.
      write(inputs.some((i) => params.has(i.key)) ? engine : null, nextSystem);
    },
    [write, engine, params, inputs],
  );

  const reset = useCallback(() => write(null, system), [write, system]);

  /** Only the numbers: what a solve can be asked with. */
  const engineNumbers = useMemo(() => {
    const out: Record<string, number> = {};
    for (const [k, v] of Object.entries(engine)) if (typeof v === 'number') out[k] = v;
    return out;
  }, [engine]);

  return { system, engine, engineNumbers, display, setDisplayValues, setSystem, reset };
}
