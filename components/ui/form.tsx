"use client";

import { useSyncExternalStore, type FormHTMLAttributes } from "react";

const subscribe = () => () => {};

/**
 * True once this component runs in the browser after hydration; false in the server's HTML and
 * during hydration itself (React's getServerSnapshot), so both render the same markup.
 */
export function useHydrated(): boolean {
  return useSyncExternalStore(
    subscribe,
    () => true,
    () => false,
  );
}

/**
 * A form whose controls stay disabled until its script has hydrated. Before that, typing would be
 * overwritten by the form's own values when React takes over, and a click on submit would send the
 * page a native GET with the answers in the address. A disabled `<fieldset>` disables every control
 * inside it (HTML Living Standard, "the fieldset element"); `display: contents` keeps the layout the
 * form's own.
 */
export function Form({ children, ...props }: FormHTMLAttributes<HTMLFormElement>) {
  const hydrated = useHydrated();
  return (
    <form {...props}>
      <fieldset disabled={!hydrated} aria-busy={!hydrated || undefined} className="contents">
        {children}
      </fieldset>
    </form>
  );
}
