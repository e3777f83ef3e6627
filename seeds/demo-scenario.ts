// Invented demo scenario: two fictional vendors and fictional people. No real company or person.
import type { Role } from "@/lib/auth/roles";

export const DEMO_PASSWORD = "swarfbook-demo";

export type DemoPerson = { email: string; name: string; roles: Record<string, Role> };

export const DEMO_VENDORS = [
  {
    slug: "northbeck",
    name: "Northbeck Tooling (demo)",
    accentColor: "#1f5f5b",
    logo: `<svg xmlns="http://www.w3.org/2000/svg" viewBox="0 0 32 32"><rect width="32" height="32" rx="6" fill="#1f5f5b"/><path d="M8 24V8l16 16V8" stroke="#fff" stroke-width="3" fill="none" stroke-linecap="round" stroke-linejoin="round"/></svg>`,
    settings: { libraryPublic: true, requireSecondApproval: true },
  },
  {
    slug: "quillon",
    name: "Quillon Cutters (demo)",
    accentColor: "#8a3b12",
    logo: `<svg xmlns="http://www.w3.org/2000/svg" viewBox="0 0 32 32"><rect width="32" height="32" rx="16" fill="#8a3b12"/><circle cx="15" cy="15" r="7" stroke="#fff" stroke-width="3" fill="none"/><path d="M19 19l6 6" stroke="#fff" stroke-width="3" stroke-linecap="round"/></svg>`,
    settings: { libraryPublic: false, requireSecondApproval: true },
  },
] as const;

const person = (email: string, name: string, roles: Record<string, Role>): DemoPerson => ({ email, name, roles });

export const DEMO_PEOPLE: DemoPerson[] = [
  person("operator@swarfbook.test", "Platform Operator", {}),
  person("admin@northbeck.test", "Hanne Ostrowski", { northbeck: "admin" }),
  person("eng1@northbeck.test", "Tobias Rendell", { northbeck: "engineer" }),
  person("eng2@northbeck.test", "Mirela Santos", { northbeck: "engineer" }),
  person("support1@northbeck.test", "Dev Kapoor", { northbeck: "support" }),
  person("support2@northbeck.test", "Ines Larroque", { northbeck: "support" }),
  person("admin@quillon.test", "Pieter Vandamme", { quillon: "admin" }),
  person("eng1@quillon.test", "Sora Whitfield", { quillon: "engineer" }),
  person("eng2@quillon.test", "Femi Adeyemi", { quillon: "engineer" }),
  person("support1@quillon.test", "Lena Brauer", { quillon: "support" }),
  person("support2@quillon.test", "Marco Ferrante", { quillon: "support" }),
  person("maker@example.test", "Riley Okafor (maker space)", { northbeck: "customer" }),
  person("shop@example.test", "Jo Lindqvist (job shop)", { northbeck: "customer", quillon: "customer" }),
  person("hobby@example.test", "Sam Achterberg (hobby router)", { northbeck: "customer" }),
  person("signs@example.test", "Ada Moreau (sign maker)", { quillon: "customer" }),
  person("cabinets@example.test", "Kai Brennan (cabinet shop)", { quillon: "customer" }),
];

export const OPERATOR_EMAIL = "operator@swarfbook.test";
