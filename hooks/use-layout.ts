import { useWindowDimensions } from "react-native";
import { WIDE_MIN_PX } from "@/constants/theme";

/** Phone first: the wide layout (side rail, tables) starts at WIDE_MIN_PX. */
export function useIsWide(): boolean {
  return useWindowDimensions().width >= WIDE_MIN_PX;
}
