/** Offers a waiting new version of the app, but only when no form holds unsaved input. */
import { anyUnsaved } from '../../lib/unsaved-forms.ts';
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
          <p>A new version of Trialbook is ready. Your records stay on this phone.</p>
          <button type="button" class="btn primary" onClick={applyUpdate}>
            Use the new version
          </button>
        </>
      )}
    </div>
  );
}
