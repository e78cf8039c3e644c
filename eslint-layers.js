// The layers, top to bottom: app -> components -> hooks -> lib -> rules, and server -> lib -> db -> rules
// (lib/ builds its input schemas from the tables, so db/ takes its fixed lists from rules/, not lib/).
// Each layer may import only the ones below it; scripts and tests may import anything.
const prefixes = ["@/", "../", "../../", "../../../", "../../../../"];
const above = (...folders) => folders.flatMap((f) => prefixes.flatMap((p) => [`${p}${f}`, `${p}${f}/**`]));
const layer = (files, folders, why, paths = []) => ({
  files,
  rules: {
    "no-restricted-imports": [
      "error",
      { paths, patterns: [{ group: above(...folders), message: `${why} (see DEVELOPERS.md, "Layout").` }] },
    ],
  },
});

export const layerRules = [
  layer(
    ["rules/**"],
    ["lib", "hooks", "components", "app", "server", "db", "scripts"],
    "rules/ is the bottom layer: pure foundry knowledge",
  ),
  layer(
    ["lib/**"],
    ["hooks", "components", "app", "server", "scripts"],
    "lib/ is shared by app and server and imports only rules/ (and table definitions)",
  ),
  layer(["hooks/**"], ["components", "app", "server", "db", "scripts"], "hooks/ sit below components and routes"),
  layer(["components/**"], ["app", "server", "db", "scripts"], "components/ do not import routes or server code"),
  layer(["app/**"], ["server", "db", "scripts"], "routes reach the server through the API, not by import"),
  layer(
    ["db/**"],
    ["server", "lib", "app", "components", "hooks", "scripts"],
    "db/ holds tables and the client; it takes its URL as a parameter and its fixed lists from rules/",
    // The web app bundles the table modules (lib/ builds its input schemas from them): pg-core's index
    // also brings the query builders, dialect and session, about 60 KB the app never runs.
    [
      {
        name: "drizzle-orm/pg-core",
        message:
          "import from drizzle-orm/pg-core/table, /columns, /indexes... so the web app does not bundle the query builders",
      },
    ],
  ),
  layer(["server/**"], ["app", "components", "hooks", "scripts"], "the server does not import the app"),
];
