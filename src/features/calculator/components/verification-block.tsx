import type { SolveResult } from '../../../../shared/mechanics/solve-result';
import { formatTiny } from '../../../lib/units/format-number';

type Verification = SolveResult['verification'];

const CLOSES = 1e-9;

/** The solve's own checks in plain words, so a reader can see that the numbers close. */
export function verificationSentences(v: Verification, partLabel: (id: string) => string): { ok: boolean; text: string }[] {
  const out: { ok: boolean; text: string }[] = [];
  const worst = v.residualPart ? ` (largest on ${partLabel(v.residualPart)})` : '';
  out.push({
    ok: v.maxResidual <= CLOSES,
    text: `Every part balances to ${formatTiny(v.maxResidual)} of the largest force${worst}.`,
  });
  out.push({
    ok: v.globalBalance.relative <= CLOSES,
    text: `Loads and ground reactions balance to ${formatTiny(v.globalBalance.relative)} of the largest force.`,
  });
  if (v.virtualWork) {
    out.push({
      ok: v.virtualWork.relativeDifference <= 1e-6,
      text: `Virtual work agrees to ${formatTiny(v.virtualWork.relativeDifference)}: the mechanical advantage is ${Number(v.virtualWork.fromEquilibrium.toPrecision(5))} from equilibrium and ${Number(v.virtualWork.fromVirtualWork.toPrecision(5))} from virtual work.`,
    });
  } else if (v.virtualWorkNote) {
    out.push({ ok: true, text: v.virtualWorkNote });
  }
  out.push({
    ok: v.conditioning > 1e-10,
    text:
      v.conditioning > 1e-6
        ? `The equilibrium equations are well determined (reciprocal condition ${formatTiny(v.conditioning)}).`
        : `The equilibrium equations are close to singular (reciprocal condition ${formatTiny(v.conditioning)}): small changes of geometry move the forces a lot.`,
  });
  return out;
}

export function VerificationBlock({ verification, partLabel }: { verification: Verification; partLabel: (id: string) => string }) {
  const lines = verificationSentences(verification, partLabel);
  return (
    <ul className="grid gap-1.5 text-sm leading-relaxed text-ink-900">
      {lines.map((l) => (
        <li key={l.text} className="flex items-start gap-2">
          <span aria-hidden="true" className={`mt-0.5 font-extrabold ${l.ok ? 'text-verdict-pass' : 'text-verdict-warn'}`}>
            {l.ok ? '✓' : '!'}
          </span>
          <span>
            <span className="sr-only">{l.ok ? 'Closes: ' : 'Look closer: '}</span>
            {l.text}
          </span>
        </li>
      ))}
    </ul>
  );
}
