import type { SolveResult } from '../mechanics/solve-result';
import { formatNumber } from '../units/format';
import type { UnitSystem } from '../units/unit-systems';
import { directionWords, forceText, momentText, partName, turnWord } from './force-words';
import type { DrawingSpec } from './spec-geometry';

export interface TextSection {
  heading: string;
  items: string[];
}

export interface TextAlternative {
  /** One sentence naming the mechanism and what it holds. */
  summary: string;
  sections: TextSection[];
  /** Summary, then each heading followed by its items: for a plain list or a report. */
  lines: string[];
}

const plural = (n: number, one: string, many: string) => `${n} ${n === 1 ? one : many}`;

/**
 * The drawing in words, for screen readers and the printed report: what the mechanism is
 * made of, then every load, joint force, member force and free body. Everything a drawing
 * shows by an arrow or a tint is said here in words.
 */
export function forcesTextAlternative(spec: DrawingSpec, result: SolveResult, unitSystem: UnitSystem): TextAlternative {
  const members = spec.members ?? [];
  const joints = spec.joints ?? [];
  const summary =
    `${spec.title}: ${plural(spec.parts.length, 'part', 'parts')}, ${plural(members.length, 'two-force member', 'two-force members')}, ` +
    `${plural(joints.length, 'joint', 'joints')} and ${plural(spec.loads.length, 'load', 'loads')}.`;
  const F = (n: number) => forceText(n, unitSystem);

  const loads: TextSection = {
    heading: 'Loads',
    items: result.loads.map((l) => {
      const solved = l.solved ? ' (solved)' : ' (given)';
      if (l.kind === 'couple') return `${l.label}: couple on ${partName(spec, l.on)}, ${momentText(l.magnitude, unitSystem)} ${turnWord(l.magnitude)}${solved}.`;
      return `${l.label}: on ${partName(spec, l.on)} at point ${l.at ?? '?'}, ${F(Math.hypot(l.fx, l.fy))} ${directionWords(l.fx, l.fy)}${solved}.`;
    }),
  };

  const jointsSection: TextSection = {
    heading: 'Joints (force on the first part named)',
    items: result.joints.map((j) => {
      const [a, b] = j.between;
      let line = `${j.label}: ${j.kind} at point ${j.at} between ${partName(spec, a)} and ${partName(spec, b)}; ${F(j.resultant)} on ${partName(spec, a)}`;
      if (j.resultant > 0) line += ` ${directionWords(j.fx, j.fy)}`;
      line += `, x ${F(j.fx)}${j.fx < 0 ? ' leftwards' : ''}, y ${F(j.fy)}${j.fy < 0 ? ' downwards' : ''}`;
      if (j.kind !== 'pin' && j.normal !== undefined) line += `; normal ${F(j.normal)}${j.normal < 0 ? ' (pulling apart)' : ''}`;
      if (j.friction !== undefined && j.friction !== 0) line += `; friction ${F(j.friction)}`;
      if (j.muRequired !== undefined) line += j.muRequired === null ? '; no friction coefficient can hold it (the contact pulls apart)' : `; friction coefficient needed ${formatMu(j.muRequired)}`;
      return `${line}.`;
    }),
  };

  const membersSection: TextSection = {
    heading: 'Two-force members (tension positive)',
    items: result.members.map((m) => {
      const state = m.state === 'unloaded' ? 'unloaded' : `${F(m.axial)} ${m.state}`;
      return `${m.label}: between points ${m.ends[0]} and ${m.ends[1]}, ${state}.`;
    }),
  };

  const bodies: TextSection[] = result.freeBodies.map((b) => ({
    heading: `Free body of ${b.label}`,
    items: [
      ...b.forces.map((f) => {
        const member = f.source === 'member' ? result.members.find((m) => m.id === f.id) : undefined;
        const state = member && member.state !== 'unloaded' ? `, ${member.state}` : '';
        return `${f.label}: ${F(f.magnitude)} at point ${f.at}${f.magnitude > 0 ? ` ${directionWords(f.fx, f.fy)}` : ''}${state}.`;
      }),
      ...b.couples.map((c) => `${c.label}: couple ${momentText(c.moment, unitSystem)} ${turnWord(c.moment)}.`),
    ],
  }));

  const sections = [loads, jointsSection, membersSection, ...bodies].filter((s) => s.items.length > 0);
  return { summary, sections, lines: [summary, ...sections.flatMap((s) => [`${s.heading}:`, ...s.items.map((i) => `– ${i}`)])] };
}

const formatMu = (mu: number) => formatNumber(mu, { significant: 3 });
