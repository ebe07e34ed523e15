/** Prettier is the house formatter: `npm run format` writes, `npm test` checks. */
export default {
  printWidth: 100,
  plugins: ["prettier-plugin-tailwindcss"],
  // Tailwind v4 reads the theme from the stylesheet; the plugin sorts classes by it.
  tailwindStylesheet: "./app/globals.css",
  tailwindFunctions: ["clsx", "cn"],
};
