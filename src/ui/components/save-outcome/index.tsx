/** What came of the last save on a card that adds runs: the saved note, or the problem in words. */
export type SaveOutcomeProps = {
  readonly saved: string | null | undefined;
  readonly problem: string | null | undefined;
};

export function SaveOutcome({ saved, problem }: SaveOutcomeProps) {
  return (
    <>
      {saved && (
        <p class="saved-note" role="status">
          {saved}
        </p>
      )}
      {problem && (
        <p class="problem input" role="alert">
          {problem}
        </p>
      )}
    </>
  );
}
