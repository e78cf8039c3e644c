import { authClient } from "./auth-client";
import { slugFor } from "./auth-forms";

/** Creates a shop (the creator becomes its owner) and makes it the active one. */
export async function createShop(name: string): Promise<string | undefined> {
  const { data, error } = await authClient.organization.create({ name, slug: slugFor(name) });
  if (error || !data) return error?.message ?? "The shop could not be created; try again.";
  await authClient.organization.setActive({ organizationId: data.id });
  return undefined;
}
