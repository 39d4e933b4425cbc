/**
 * Offers a waiting new version of the app, but only when reloading loses no typing: a form's
 * typing kept as a draft comes back after the update; typing not yet kept holds the offer back.
 */
import { anyKeptAsDraft, anyUnsaved } from '../../lib/unsaved-forms.ts';
import { applyUpdate, updateWaiting } from '../../sw-bridge.ts';
import './style.css';

export type UpdateBannerProps = Record<string, never>;

export function UpdateBanner(_props: UpdateBannerProps) {
  if (!updateWaiting.value) return null;
  return (
    <div class="update-banner" role="status">
      {anyUnsaved.value ? (
        <p>A new version of Trialbook is ready. It will be offered once the run you are typing is saved.</p>
      ) : (
        <>
          <p>
            A new version of Trialbook is ready. Your records stay on this phone.
            {anyKeptAsDraft.value && ' The run you are typing is kept as a draft and comes back after the update; it is not saved yet.'}
          </p>
          <button type="button" class="btn primary" onClick={applyUpdate}>
            Use the new version
          </button>
        </>
      )}
    </div>
  );
}
