/**
 * Runs `task` once, right after the browser has drawn its next frame: for work a keystroke
 * causes but its frame does not need (sending, storing, publishing the caret). Where no frame
 * comes (a hidden tab, a test without a DOM) it runs after `longestWaitMs` instead.
 *
 * @example
 * afterNextFrame(() => socket.send(batch)); // the typed character is on screen first
 */
export function afterNextFrame(task: () => void, longestWaitMs = 100): void {
  let done = false;
  const once = () => {
    if (done) return;
    done = true;
    clearTimeout(fallback);
    task();
  };
  const fallback = setTimeout(once, longestWaitMs);
  if (typeof requestAnimationFrame === "function") requestAnimationFrame(() => setTimeout(once, 0));
}
