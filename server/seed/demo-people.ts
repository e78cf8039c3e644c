/**
 * The invented demo shop and its people. Local use only: `npm start` prints these and the
 * README lists them; seeding never runs with NODE_ENV=production.
 */
export const DEMO_SHOP = { name: "Quillstone Foundry Lab", slug: "quillstone-foundry-lab" };

export const DEMO_PEOPLE = [
  { role: "owner", name: "Noor Halvorsen", email: "owner@quillstone.example", password: "demo-owner-2026" },
  { role: "mentor", name: "Piet Aldana", email: "mentor@quillstone.example", password: "demo-mentor-2026" },
  { role: "caster", name: "Kit Morrow", email: "caster@quillstone.example", password: "demo-caster-2026" },
] as const;
