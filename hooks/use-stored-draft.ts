import AsyncStorage from "@react-native-async-storage/async-storage";
import { useEffect, useRef, useState } from "react";
import { useMe } from "@/hooks/use-me";
import type { Units } from "@/lib/units";

/**
 * A form's draft kept on the device (localStorage on web) as it is typed, so a reload, a tab the
 * browser discarded or a lost connection loses nothing. Stored per person and form, with the units
 * it was typed in (a draft in °F is not read back as °C). An untouched form stores nothing.
 */
export function useStoredDraft<T>(
  form: string | undefined,
  units: Units,
  draft: T,
  initial: T,
  replace: (d: T) => void,
) {
  const userId = useMe().data?.user.id;
  const key = form && userId ? `casebook:${userId}:draft:${form}` : undefined;
  const loadedKey = useRef<string | undefined>(undefined);
  const [restored, setRestored] = useState(false);
  const initialJson = useRef(JSON.stringify(initial));

  useEffect(() => {
    if (!key) return;
    let live = true;
    AsyncStorage.getItem(key)
      .then((raw) => {
        const stored = raw ? (JSON.parse(raw) as { units: Units; draft: T }) : undefined;
        if (live && stored && JSON.stringify(stored.units) === JSON.stringify(units)) {
          replace(stored.draft);
          setRestored(true);
        }
      })
      .catch(() => undefined) // A draft that cannot be read is no draft.
      .finally(() => {
        if (live) loadedKey.current = key;
      });
    return () => {
      live = false;
    };
    // Read once per form and person; later changes of `replace` or `units` do not re-read.
  }, [key]);

  useEffect(() => {
    if (!key || loadedKey.current !== key) return;
    if (JSON.stringify(draft) === initialJson.current) AsyncStorage.removeItem(key).catch(() => undefined);
    else AsyncStorage.setItem(key, JSON.stringify({ units, draft })).catch(() => undefined);
  }, [key, draft, units]);

  const discard = async () => {
    setRestored(false);
    if (key) await AsyncStorage.removeItem(key).catch(() => undefined);
  };
  return { restored, discard };
}
