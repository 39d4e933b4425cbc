/**
 * Handing a file to the person: a download through a link with the download attribute, or the
 * phone's share sheet when the browser can share files.
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

/** Opens the share sheet with the text as a file; resolves false when the person cancels. */
export async function shareText(text: string, name: string, type: string, title: string): Promise<boolean> {
  const file = new File([text], name, { type });
  try {
    await navigator.share({ files: [file], title });
    return true;
  } catch (err) {
    if ((err as { name?: string }).name === 'AbortError') return false;
    throw err;
  }
}
