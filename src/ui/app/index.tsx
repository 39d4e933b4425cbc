/** The app shell: the title bar and, for now, a placeholder for the screens. */
export type AppProps = Record<string, never>;

export function App(_props: AppProps) {
  const secure = typeof window !== 'undefined' && window.isSecureContext;
  return (
    <main class="shell">
      <h1>Trialbook</h1>
      <p class="lead">Plan, log and analyse two-level experiments beside the machine.</p>
      {!secure && (
        <p class="warning" role="alert">
          This page was opened over plain http on a network address, so the browser allows no offline use and no
          lasting storage here. Records typed now may be lost. Open Trialbook from its https address, or from
          localhost on this computer.
        </p>
      )}
    </main>
  );
}
