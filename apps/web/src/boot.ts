// main.tsx imports this first, so it runs before React and the rest of the entry chunk evaluate.
import { startEarly } from "./startEarly";

startEarly(window.location.pathname);
