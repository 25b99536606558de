"use client";

import { useEffect, useRef, useState } from "react";

/**
 * Says "scroll sideways" above the scrolling frame that follows it, while that frame is wider than the screen
 * and not yet scrolled to its end: on a phone the last columns are out of sight, and nothing else would say so.
 */
export function ScrollHint() {
  const hint = useRef<HTMLParagraphElement>(null);
  const [more, setMore] = useState(false);
  useEffect(() => {
    const frame = hint.current?.nextElementSibling;
    if (!(frame instanceof HTMLElement)) return;
    const check = () => setMore(frame.scrollWidth - frame.clientWidth - frame.scrollLeft > 1);
    check();
    const resized = new ResizeObserver(check);
    resized.observe(frame);
    frame.addEventListener("scroll", check, { passive: true });
    return () => {
      resized.disconnect();
      frame.removeEventListener("scroll", check);
    };
  }, []);
  return (
    <p ref={hint} aria-hidden="true" className={more ? "mb-1 text-right text-sm font-medium text-ink-600" : "hidden"}>
      More columns: scroll sideways →
    </p>
  );
}
