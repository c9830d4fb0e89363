/**
 * Keeps fixes to what the components render applied as the app renders: each runs over the
 * page once now and again after every change (batched in a microtask).
 */
export function watchDom(
  fixes: Array<(root: ParentNode) => void>,
  root: HTMLElement = document.body,
): MutationObserver {
  const run = () => fixes.forEach((fix) => fix(root));
  let queued = false;
  const observer = new MutationObserver(() => {
    if (queued) return;
    queued = true;
    queueMicrotask(() => {
      queued = false;
      run();
      observer.takeRecords(); // the fixes' own changes need no second pass
    });
  });
  observer.observe(root, {
    subtree: true,
    childList: true,
    characterData: true,
    attributes: true,
    attributeFilter: ['aria-owns', 'aria-controls', 'aria-activedescendant', 'aria-expanded', 'aria-label', 'role'],
  });
  run();
  return observer;
}
