/**
 * The export screen's line about records that imports set aside: how many, and the link to the
 * screen that lists them. Shows nothing when there are none (or while counting); counts again
 * whenever `after` changes (the export screen passes what its last import said).
 */
import { useEffect, useState } from 'preact/hooks';
import { setAsideCountLine } from '../../../core/text/set-aside-text.ts';
import { listSetAside } from '../../../store/set-aside.ts';
import type { Store } from '../../../store/store.ts';
import { hrefTo } from '../../app/routes.ts';
import './style.css';

export type SetAsideLinkProps = { readonly store: Store; readonly after?: unknown };

export function SetAsideLink({ store, after }: SetAsideLinkProps) {
  const [count, setCount] = useState(0);
  useEffect(() => {
    let live = true;
    // A count that cannot be read shows no line; the list screen says why if opened.
    listSetAside(store).then(
      (rows) => live && setCount(rows.length),
      () => undefined,
    );
    return () => void (live = false);
  }, [store, after]);
  if (count === 0) return null;
  return (
    <div class="set-aside-link">
      <p>{setAsideCountLine(count)}</p>
      <a class="btn block" href={hrefTo('setAside', {})}>
        See the set-aside records
      </a>
    </div>
  );
}
