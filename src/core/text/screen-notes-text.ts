/**
 * The analysis notes as the Effects screen shows them: the same verdicts as the command line's
 * notes (verdict-text.ts), in words that speak only of what the screen holds. The phone shows no
 * ANOVA tables and no coding table, its model is chosen with the buttons above the notes, and
 * its bars carry the combined terms; so the screen never reads "the adjusted table", and a count
 * of terms that cannot be separated comes with the list of exactly those terms.
 * With squares in the model (a central composite or Box-Behnken study) the notes give the
 * squares' own tests and lack of fit, never Lenth's method or the two-level orthogonality.
 * Sources of the tests behind the words as in verdict-text.ts (Montgomery, Design and Analysis
 * of Experiments, 8th ed., sections 6.8, 10.7 and 11.3; Lenth 1989).
 * Cost O(number of verdicts and their lists).
 * Example: screenNotes([], [{ kind: 'not-orthogonal' }]) -> [{ text: 'Some runs are missing, off
 * target or in unequal blocks, so the effects overlap a little: each test on this screen allows
 * for all the other terms.' }].
 */
import type { Verdict } from '../fit/verdicts.ts';
import { isWarning } from '../fit/verdicts.ts';
import { quadraticNotSupported } from './second-order-text.ts';
import { curvatureStatement, squaresFinding, verdictText } from './verdict-text.ts';

/** One note of the screen: a sentence, and the items listed under it when it counts some. */
export interface ScreenNote {
  readonly text: string;
  readonly list?: readonly string[];
}

/** What the screen offers beside the notes: whether its model buttons hold the quadratic model (core/design/supports-quadratic.ts). */
export interface ScreenContext {
  readonly quadraticOffered: boolean;
}

/** One verdict as the screen says it, or null for one the screen does not show as a note. */
export function screenVerdictNote(v: Verdict, context: ScreenContext = { quadraticOffered: false }): ScreenNote | null {
  switch (v.kind) {
    case 'curvature':
      // A significant curvature without squares: the way on is the quadratic model when the
      // runs support it, else axial runs (and why the model is not offered).
      if (v.outcome !== 'curved' || (v.squares ?? []).length > 0) return isWarning(v) ? { text: verdictText(v) } : null;
      return { text: `${curvatureStatement(v)} ${context.quadraticOffered ? 'Choose the quadratic model above to fit it.' : quadraticNotSupported('screen')}` };
    case 'not-orthogonal':
      return { text: 'Some runs are missing, off target or in unequal blocks, so the effects overlap a little: each test on this screen allows for all the other terms.' };
    case 'near-replicates':
      return {
        text: `The noise is judged from repeats of the same planned point; in ${v.groups} of them the logged settings differ slightly, so the noise estimate and the lack-of-fit check are approximate.`,
      };
    case 'off-levels':
      return v.planned
        ? { text: `${v.runs} run${v.runs === 1 ? ' has a setting' : 's have settings'} logged well away from the plan (more than 0.1 coded): ${v.runs === 1 ? 'it counts' : 'each counts'} as a point of its own, not as a repeat of the plan. Check the logged settings on the run sheet.` }
        : { text: verdictText(v) };
    case 'no-residual-df':
      return v.secondOrder
        ? { text: 'No runs are left over to estimate the noise, so no test can be made; add runs to the study before relying on these figures.' }
        : { text: "No runs are left over to estimate the noise, so the verdicts on the bars come from Lenth's method, which judges each effect against the spread of the others." };
    case 'lenth-weak':
      return { text: `Lenth's method has only ${v.m} effects to work from (${v.advised} or more are advised), so its verdicts on the bars are weak here.` };
    case 'squares':
      return { text: `${squaresFinding(v)} Each test allows for all the other terms.` };
    case 'lack-of-fit':
      // A lack of fit that is not significant is said in the notes of a second-order model only
      // (screenNotes): there the squares and lack of fit are what the notes speak of.
      return isWarning(v) ? { text: verdictText(v) } : null;
    case 'aliased': {
      const items = (v.terms ?? []).map((t) => `${t.letters} cannot be told apart from ${t.equals}`);
      const n = items.length > 0 ? items.length : v.count;
      const bars = v.carried.length > 0 ? '; a bar marked “Carries” shows the combined effect' : '';
      return {
        text: `These runs cannot separate ${n} model term${n === 1 ? '' : 's'} from others, so ${n === 1 ? 'it has' : 'they have'} no bar of ${n === 1 ? 'its' : 'their'} own${bars}:`,
        ...(items.length > 0 ? { list: items } : {}),
      };
    }
    default:
      return isWarning(v) ? { text: verdictText(v) } : null;
  }
}

/**
 * The screen's notes: the messages about the runs read (skipped, excluded, edited in two
 * places), then the verdicts in screen words; for a second-order model also the plain statement
 * of lack of fit, which with the squares' tests is what such a model's notes say.
 */
export function screenNotes(messages: readonly string[], verdicts: readonly Verdict[], context: ScreenContext = { quadraticOffered: false }): ScreenNote[] {
  const secondOrder = verdicts.some((v) => v.kind === 'squares');
  const out: ScreenNote[] = messages.map((text) => ({ text }));
  for (const v of verdicts) {
    // The curvature test is stated in the fit list above the notes; a significant one is a note too.
    const note = secondOrder && v.kind === 'lack-of-fit' ? { text: verdictText(v) } : screenVerdictNote(v, context);
    if (note) out.push(note);
  }
  return out;
}
