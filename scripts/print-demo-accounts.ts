import { DEMO_LABS, DEMO_PASSWORD } from "@/lib/demo/scenario";

const url = process.argv[2] ?? "http://localhost:3000";
const lines = [
  `\nIonleaf is running at ${url}`,
  `Demo accounts (password for all: ${DEMO_PASSWORD}):`,
];
for (const lab of DEMO_LABS) {
  lines.push(`  ${lab.name}`);
  for (const m of lab.members) lines.push(`    ${m.role.padEnd(10)} ${m.email}  (${m.name})`);
}
lines.push("Press Ctrl-C to stop the app, the mail catcher and PostgreSQL.\n");
console.log(lines.join("\n"));
