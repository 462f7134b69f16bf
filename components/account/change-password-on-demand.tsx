"use client";

import dynamic from "next/dynamic";

/**
 * The change-password form for the shop layout, which shows it only to someone whose password must
 * change. Loaded when shown, so its form and schema code stay out of every other page's first load.
 */
export const ChangePasswordOnDemand = dynamic(
  () => import("./change-password-form").then((m) => m.ChangePasswordForm),
  { loading: () => <p role="status">Opening the password form…</p> },
);
