import type { Role } from "@/db/schema/enums";

/**
 * Ionleaf's demo scenario: two invented labs at an invented institute, with invented
 * people. Used by `npm start` (seeded once) and by the end-to-end tests. The addresses use
 * the reserved .example domain, so no mail can ever reach a real person.
 */
export const DEMO_PASSWORD = "copper-sulfate-42";

interface DemoMember {
  email: string;
  name: string;
  role: Role;
}

export interface DemoLab {
  slug: string;
  name: string;
  members: DemoMember[];
  projects: { name: string; description: string }[];
}

export const DEMO_LABS: DemoLab[] = [
  {
    slug: "saltmarsh-interfaces",
    name: "Saltmarsh Interfaces Group",
    members: [
      { email: "wren.admin@saltmarsh.example", name: "Wren Halloway", role: "admin" },
      { email: "odile.pi@saltmarsh.example", name: "Dr. Odile Farrant", role: "supervisor" },
      { email: "tobin.bench@saltmarsh.example", name: "Tobin Ashgrove", role: "researcher" },
      { email: "mira.bench@saltmarsh.example", name: "Mira Quennell", role: "researcher" },
    ],
    projects: [
      {
        name: "Copper corrosion in chloride media",
        description:
          "Polarisation studies of Cu electrodes in NaCl/Na2SO4 electrolytes at controlled ionic strength.",
      },
      {
        name: "Ferrocyanide kinetics",
        description:
          "Heterogeneous rate constants of the hexacyanoferrate couple on glassy carbon.",
      },
    ],
  },
  {
    slug: "ridgeback-cells",
    name: "Ridgeback Battery Cells Lab",
    members: [
      { email: "ines.admin@ridgeback.example", name: "Ines Calloway", role: "admin" },
      { email: "piet.pi@ridgeback.example", name: "Dr. Piet Varnham", role: "supervisor" },
      { email: "juno.bench@ridgeback.example", name: "Juno Marchetti", role: "researcher" },
    ],
    projects: [
      {
        name: "LiTFSI electrolytes",
        description: "Conductivity and window of concentrated LiTFSI in propylene carbonate.",
      },
    ],
  },
];
