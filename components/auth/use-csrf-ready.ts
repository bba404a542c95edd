"use client";

import { getCsrfToken } from "next-auth/react";
import { useEffect, useState } from "react";

/** True once next-auth's CSRF token has loaded; sign-in buttons wait for it so an early click cannot post without one. */
export function useCsrfReady(): boolean {
  const [ready, setReady] = useState(false);
  useEffect(() => {
    let live = true;
    void getCsrfToken().then((token) => {
      if (live && token) setReady(true);
    });
    return () => {
      live = false;
    };
  }, []);
  return ready;
}
