import { useEffect, useRef, useState } from 'react';

/** The size of an element, kept current with a ResizeObserver (a fixed fallback where there is no layout). */
export function useElementSize<T extends HTMLElement>(fallback = { width: 900, height: 600 }) {
  const ref = useRef<T>(null);
  const [size, setSize] = useState(fallback);
  useEffect(() => {
    const el = ref.current;
    if (!el) return;
    const measure = () => {
      const { width, height } = el.getBoundingClientRect();
      if (width > 0 && height > 0) setSize({ width: Math.floor(width), height: Math.floor(height) });
    };
    measure();
    const observer = new ResizeObserver(measure);
    observer.observe(el);
    return () => observer.disconnect();
  }, []);
  return { ref, ...size };
}
