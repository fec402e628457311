import { useEffect, useRef, useState } from 'react';

/** True once the element has come within `margin` of the viewport (and stays true). */
export function useNearViewport<T extends Element>(margin = '400px') {
  const ref = useRef<T | null>(null);
  const [near, setNear] = useState(false);
  useEffect(() => {
    const el = ref.current;
    if (!el || near) return;
    if (typeof IntersectionObserver === 'undefined') {
      setNear(true);
      return;
    }
    const observer = new IntersectionObserver((entries) => {
      if (entries.some((e) => e.isIntersecting)) setNear(true);
    }, { rootMargin: margin });
    observer.observe(el);
    return () => observer.disconnect();
  }, [near, margin]);
  return [ref, near] as const;
}
