"use client";

import { useEffect } from "react";

/**
 * Turns Inter on once the page has hydrated: until then text paints in the metric-matched "Slipway
 * Fallback" (app/globals.css), and the browser does not fetch the three font files while a phone on a
 * slow link still needs that bandwidth for the page's own scripts. The switch barely moves anything
 * because the fallback is scaled to Inter's metrics; without JavaScript the fallback stays.
 */
export function WebFontSwitch() {
  useEffect(() => {
    document.documentElement.dataset.webFont = "on";
  }, []);
  return null;
}
