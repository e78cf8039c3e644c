import { zxcvbn, zxcvbnOptions } from "@zxcvbn-ts/core";
import * as common from "@zxcvbn-ts/language-common";
import { PASSWORD_MIN } from "../../lib/auth-forms";

/**
 * A new password is at least PASSWORD_MIN characters and not one of the passwords people pick most
 * (zxcvbn's lists of common passwords, words, names and keyboard runs): a score below 2 of 4 means
 * "guessable in well under a day of online tries", so "12345678" or "password1" are refused.
 */
let loaded = false;
export function passwordProblem(password: string, hints: string[] = []): string | undefined {
  if (password.length < PASSWORD_MIN) return `That password is too short: use at least ${PASSWORD_MIN} characters`;
  if (!loaded) {
    zxcvbnOptions.setOptions({ dictionary: { ...common.dictionary }, graphs: common.adjacencyGraphs });
    loaded = true;
  }
  if (zxcvbn(password, hints).score < 2)
    return "That password is one of the most common ones; pick a less guessable one (a few unrelated words work well)";
  return undefined;
}
