/** An address that names no screen: says so and offers the way back to the studies. */
import { hrefTo } from '../../app/routes.ts';

export type MissingScreenProps = { readonly path: string };

export function MissingScreen({ path }: MissingScreenProps) {
  return (
    <section>
      <h2>No such page</h2>
      <p>The address "{path}" is not a page of Trialbook.</p>
      <a class="btn primary block" href={hrefTo('studies', {})}>
        Go to the studies
      </a>
    </section>
  );
}
