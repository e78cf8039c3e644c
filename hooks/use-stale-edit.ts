import { useState } from "react";
import { ApiError } from "@/lib/api";

/**
 * An edit form saved with If-Match: the row version it opened at, and what to do when the save is
 * refused (412) because someone else saved since. `mine` is what was sent, `theirs` the row as it now is;
 * keeping mine sends it again at their version, taking theirs opens the form again at it (`formKey`).
 */
export function useStaleEdit<Row extends { version: number }, Input>(
  send: (arg: { input: Input; version: number }) => Promise<unknown>,
  initial?: Row,
) {
  const [opened, setOpened] = useState<Row | undefined>(initial);
  const [conflict, setConflict] = useState<{ mine: Input; theirs: Row }>();
  const [formKey, setFormKey] = useState(0);

  /** True when saved; false when refused as stale (the form keeps what was typed). */
  async function save(input: Input, version: number): Promise<boolean> {
    try {
      await send({ input, version });
      return true;
    } catch (e) {
      if (!(e instanceof ApiError && e.status === 412 && e.current)) throw e;
      setConflict({ mine: input, theirs: e.current as Row });
      return false;
    }
  }
  function keepMine() {
    if (!conflict) return Promise.resolve(false);
    setConflict(undefined);
    return save(conflict.mine, conflict.theirs.version);
  }
  function takeTheirs() {
    if (!conflict) return;
    setOpened(conflict.theirs);
    setConflict(undefined);
    setFormKey((k) => k + 1);
  }
  return { opened, setOpened, conflict, formKey, save, keepMine, takeTheirs };
}
