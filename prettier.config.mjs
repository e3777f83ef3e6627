// Applied to the whole tree in one commit of its own; `npm run format:check` keeps it so.
const config = {
  printWidth: 140,
  plugins: ["@ianvs/prettier-plugin-sort-imports"],
  importOrder: ["<BUILTIN_MODULES>", "<THIRD_PARTY_MODULES>", "", "^@/(.*)$", "", "^[.]"],
  importOrderTypeScriptVersion: "5.9.0",
};

export default config;
