import { BUILT_IN_RULE_SET } from "../../rules/knowledge-base";
import { causesOf } from "./context";

/** Every cause a shop can name, built-in and its own, by id: what a confirmation's cause id reads as. */
export async function causeTitles(shopId: string): Promise<Map<string, string>> {
  const all = [...BUILT_IN_RULE_SET.causes, ...(await causesOf(shopId))];
  return new Map(all.map((c) => [c.id, c.title]));
}
