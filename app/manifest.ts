import type { MetadataRoute } from "next";
import { ICON_FILES } from "@/lib/brand/icons";

// Served at /manifest.webmanifest, so a phone can keep Chillwright on its home screen.
export default function manifest(): MetadataRoute.Manifest {
  return {
    id: "/",
    name: "Chillwright",
    short_name: "Chillwright",
    description: "Diagnostic casebook for vehicle air-conditioning service.",
    start_url: "/cases",
    scope: "/",
    display: "standalone",
    orientation: "portrait",
    // glacier-700 (the page's theme colour) and the page background, from tailwind.config.ts.
    theme_color: "#05476b",
    background_color: "#eef2f5",
    icons: ICON_FILES.flatMap((icon) =>
      icon.manifest
        ? [
            {
              src: icon.manifest.src,
              sizes: `${icon.sizePx}x${icon.sizePx}`,
              type: "image/png",
              purpose: icon.manifest.purpose,
            },
          ]
        : [],
    ),
  };
}
