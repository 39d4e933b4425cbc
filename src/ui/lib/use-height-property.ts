/**
 * Keeps a CSS custom property on the root element equal to an element's height while the element
 * is on screen, for a scroll padding under a sticky block whose height depends on its content
 * (the quick card's prediction and caution wrap differently on every phone). Removed again when
 * the component goes away.
 */
import { useCallback, useEffect, useRef } from 'preact/hooks';

export function useHeightProperty(name: string): (el: HTMLElement | null) => void {
  const observer = useRef<ResizeObserver | null>(null);
  useEffect(
    () => () => {
      observer.current?.disconnect();
      document.documentElement.style.removeProperty(name);
    },
    [name],
  );
  return useCallback(
    (el: HTMLElement | null) => {
      observer.current?.disconnect();
      observer.current = null;
      if (!el) return;
      const root = document.documentElement;
      const ro = new ResizeObserver(() => root.style.setProperty(name, `${el.getBoundingClientRect().height}px`));
      ro.observe(el);
      observer.current = ro;
    },
    [name],
  );
}
