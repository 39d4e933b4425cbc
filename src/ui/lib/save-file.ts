/**
 * Handing a file to the person: the phone's share sheet when the browser accepts this very file
 * (navigator.canShare({ files }) then navigator.share), otherwise a download through a link with
 * the download attribute. The share sheet comes first because an app installed on an iPhone opens
 * a plain download in a preview with no way back to the app.
 */

/** A file name from a study title: 'trialbook-invented-demo-powder-coating-cure-trial-2024-05-02.json'. */
export function fileName(title: string, ext: 'json' | 'csv', date = new Date()): string {
  const slug = title
    .toLowerCase()
    .normalize('NFKD')
    .replace(/[^a-z0-9]+/g, '-')
    .replace(/^-+|-+$/g, '')
    .slice(0, 60);
  const day = date.toISOString().slice(0, 10);
  return `trialbook-${slug || 'study'}-${day}.${ext}`;
}

export function mimeOf(ext: 'json' | 'csv'): string {
  return ext === 'json' ? 'application/json' : 'text/csv;charset=utf-8';
}

/** Starts a download of the text as a file. */
export function downloadText(text: string, name: string, type: string): void {
  const url = URL.createObjectURL(new Blob([text], { type }));
  const a = document.createElement('a');
  a.href = url;
  a.download = name;
  a.rel = 'noopener';
  a.style.display = 'none';
  document.body.append(a);
  a.click();
  a.remove();
  // Give the browser time to start reading the blob before it is released.
  setTimeout(() => URL.revokeObjectURL(url), 60_000);
}

/** True when this browser can hand files to the share sheet. */
export function canShareFiles(): boolean {
  try {
    const probe = new File(['x'], 'probe.txt', { type: 'text/plain' });
    return typeof navigator.share === 'function' && typeof navigator.canShare === 'function' && navigator.canShare({ files: [probe] });
  } catch {
    return false;
  }
}

/** What became of a file handed to the person. */
export type SaveOutcome = 'shared' | 'cancelled' | 'downloaded';

/** True when the browser says it can share this file (false when it cannot say or throws). */
function acceptsFile(file: File): boolean {
  try {
    return typeof navigator.share === 'function' && typeof navigator.canShare === 'function' && navigator.canShare({ files: [file] });
  } catch {
    return false;
  }
}

/**
 * Hands the text to the person as a file: the share sheet when the browser accepts the file,
 * else a download. 'cancelled' when the person closed the share sheet (nothing was sent). Any
 * other refusal of the share (NotAllowedError when the tap's activation has run out, a type
 * refused only at sharing; https://developer.mozilla.org/docs/Web/API/Navigator/share) falls back
 * to a download, so a file always comes out.
 */
export async function saveText(text: string, name: string, type: string, title: string): Promise<SaveOutcome> {
  const file = new File([text], name, { type });
  if (acceptsFile(file)) {
    try {
      await navigator.share({ files: [file], title });
      return 'shared';
    } catch (err) {
      if ((err as { name?: string }).name === 'AbortError') return 'cancelled';
    }
  }
  downloadText(text, name, type);
  return 'downloaded';
}
