/**
 * The runs of a study as one table, in run order: on a wide screen with the planned and actual
 * settings and each response's mean, and on paper (blank) with the planned settings and empty
 * boxes to write the readings and notes in beside the machine.
 */
import { RUN_KIND_NAMES } from '../../../core/design/design.ts';
import type { StudyRecord } from '../../../core/study/study.ts';
import { hrefTo } from '../../app/routes.ts';
import { setting, withUnit } from '../../lib/format.ts';
import { awaitsReading, type SheetRow } from '../../models/run-sheet-model.ts';
import './style.css';

export type RunTableProps = {
  readonly study: StudyRecord;
  readonly rows: readonly SheetRow[];
  /** Paper for the clipboard: planned settings and empty boxes, no logged values and no links. */
  readonly blank?: boolean;
  readonly class?: string;
};

function stateOf(row: SheetRow): string {
  if (row.logged.length === 0) return 'Not logged';
  return row.excluded ? 'Excluded' : awaitsReading(row) ? 'No reading yet' : 'Logged ✓';
}

export function RunTable({ study, rows, blank = false, class: extra }: RunTableProps) {
  const unitOf = (i: number) => {
    const f = study.factors[i];
    return f.kind === 'numeric' ? f.unit : undefined;
  };
  return (
    <div class={`run-table-wrap ${blank ? 'blank' : ''} ${extra ?? ''}`}>
      <table class="run-table">
        <caption>{blank ? `${study.title}: run sheet to fill in` : `Runs of ${study.title}`}</caption>
        <thead>
          <tr>
            <th scope="col" rowSpan={2}>Run</th>
            <th scope="col" rowSpan={2}>Kind</th>
            {study.factors.map((f) => (
              <th scope="colgroup" colSpan={blank ? 1 : 2} key={f.name}>
                {f.name}
              </th>
            ))}
            {study.responses.map((r) => (
              <th scope="col" rowSpan={2} key={r.name}>
                {r.name}
                {r.unit ? ` (${r.unit})` : ''}
              </th>
            ))}
            <th scope="col" rowSpan={2}>{blank ? 'Notes' : 'State'}</th>
          </tr>
          <tr>
            {study.factors.map((f) =>
              blank ? (
                <th scope="col" key={f.name}>planned</th>
              ) : (
                [<th scope="col" key={`${f.name}-p`}>planned</th>, <th scope="col" key={`${f.name}-a`}>actual</th>]
              ),
            )}
          </tr>
        </thead>
        <tbody>
          {rows.map((row) => {
            const first = row.logged[0];
            return (
              <tr key={row.run} data-run={row.run} class={blank ? '' : row.logged.length === 0 ? 'open' : row.excluded ? 'excluded' : 'logged'}>
                <th scope="row">
                  {blank ? (
                    row.run
                  ) : (
                    <a href={hrefTo('runForm', { studyId: study.id, plannedRun: row.run })} aria-label={`${row.logged.length ? 'Review' : 'Log'} run ${row.run}`}>
                      {row.run}
                    </a>
                  )}
                </th>
                <td>{RUN_KIND_NAMES[row.kind]}</td>
                {row.planned.map((p, i) =>
                  blank ? (
                    <td class="num" key={i}>{setting(p, unitOf(i))}</td>
                  ) : (
                    [
                      <td class="num" key={`${i}-p`}>{setting(p, unitOf(i))}</td>,
                      <td class={first && first.actual[i] !== p ? 'num differs' : 'num'} key={`${i}-a`}>
                        {first ? setting(first.actual[i], unitOf(i)) : '–'}
                      </td>,
                    ]
                  ),
                )}
                {study.responses.map((r, i) => (
                  <td class={blank ? 'box' : 'num'} key={r.name}>
                    {blank ? '' : row.excluded ? '–' : withUnit(row.means[i], r.unit)}
                  </td>
                ))}
                <td class={blank ? 'box notes' : 'state'}>{blank ? '' : stateOf(row)}</td>
              </tr>
            );
          })}
        </tbody>
      </table>
    </div>
  );
}
