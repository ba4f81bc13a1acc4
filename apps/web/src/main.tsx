// First, before React evaluates: starts the first screen's requests, chunk and engine worker. In
// the build it is also its own entry, which index.html loads before this one (vite.config.ts).
import "./boot";
import { StrictMode } from "react";
import { createRoot } from "react-dom/client";
// IBM Plex Sans ships inside the bundle; the app never fetches fonts or scripts from elsewhere.
import "@fontsource/ibm-plex-sans/400.css";
import "@fontsource/ibm-plex-sans/500.css";
import "@fontsource/ibm-plex-sans/600.css";
import "./styles.css";
import { App } from "./App";

const root = document.getElementById("root");
if (root === null) throw new Error("index.html has no #root element");

createRoot(root).render(
  <StrictMode>
    <App />
  </StrictMode>,
);
