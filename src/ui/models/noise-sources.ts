/**
 * Earlier studies on this device as a source of the run-to-run noise for planning: for every
 * response of every study whose analysis (with the study's default model) has residual degrees
 * of freedom, its residual standard deviation. The planning form offers those whose response
 * has the same name as one of its own.
 */
import { listRuns } from '../../store/runs.ts';
import { listStudies } from '../../store/studies.ts';
import type { Store } from '../../store/store.ts';
import { analyzeResponse, defaultSettings } from './study-analysis-model.ts';

export interface NoiseSource {
  readonly studyId: string;
  readonly title: string;
  readonly response: string;
  /** Residual standard deviation of the analysis. */
  readonly sigma: number;
  /** Its residual degrees of freedom. */
  readonly df: number;
}

/** Every residual SD the device's studies give, by study (newest first) then response in declared order. */
export async function noiseSources(store: Store): Promise<NoiseSource[]> {
  const studies = await listStudies(store);
  const out: NoiseSource[] = [];
  for (const study of [...studies].sort((a, b) => (a.createdAt < b.createdAt ? 1 : a.createdAt > b.createdAt ? -1 : 0))) {
    const runs = await listRuns(store, study.id);
    if (runs.length === 0) continue;
    study.responses.forEach((r, i) => {
      const res = analyzeResponse({ study, runs, diverged: [] }, i, defaultSettings(study));
      if (res.ok && res.analysis.sigma !== null && res.analysis.sigma > 0 && res.analysis.df.residual > 0) {
        out.push({ studyId: study.id, title: study.title, response: r.name, sigma: res.analysis.sigma, df: res.analysis.df.residual });
      }
    });
  }
  return out;
}
