import type { MetadataRoute } from "next";

/** The web app manifest: the product's own name, colours and icon, for a phone's home screen. */
export default function manifest(): MetadataRoute.Manifest {
  return {
    name: "Understudy: standard parts for old machines",
    short_name: "Understudy",
    description:
      "Find the modern standard part that takes the place of an obsolete factory number, or measure the worn part.",
    start_url: "/",
    display: "standalone",
    background_color: "#f6f2ea",
    theme_color: "#f6f2ea",
    icons: [{ src: "/icon.svg", sizes: "any", type: "image/svg+xml", purpose: "any" }],
  };
}
