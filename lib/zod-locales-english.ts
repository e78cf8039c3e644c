// zod's locales index as the web bundle sees it: English alone (see metro.config.cjs for why).
export { default as en } from "zod/v4/locales/en.js";
