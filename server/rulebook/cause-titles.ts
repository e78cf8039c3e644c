import type { KbCause } from "../../rules/kb-schema";
import { BUILT_IN_RULE_SET } from "../../rules/knowledge-base";
import { causesOf } from "./context";

/** Every cause a shop can name: the built-in ones and those its mentors added. */
export async function allCausesOf(shopId: string): Promise<KbCause[]> {
  return [...BUILT_IN_RULE_SET.causes, ...(await causesOf(shopId))];
}

/** Every cause a shop can name, by id: what a confirmation's cause id reads as. */
export async function causeTitles(shopId: string): Promise<Map<string, string>> {
  return new Map((await allCausesOf(shopId)).map((c) => [c.id, c.title]));
}
