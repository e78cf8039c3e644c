/** Roles in the app's words: the chips that choose one, and what each may do. */
export const ROLE_CHOICES = [
  { value: "caster", label: "Caster" },
  { value: "mentor", label: "Mentor" },
  { value: "owner", label: "Owner" },
] as const;

export const ROLE_MEANS: Record<string, string> = {
  caster: "logs melts and castings, marks defects, asks for diagnoses",
  mentor: "also reviews cases and keeps the shop's rules",
  owner: "also invites people, sets roles and the shop's defaults",
};
