import { QueryClient, QueryClientProvider } from "@tanstack/react-query";
import { act, cleanup, renderHook } from "@testing-library/react";
import type { ReactNode } from "react";
import { afterEach, describe, expect, it } from "vitest";
import { useMeltDraft } from "@/hooks/use-melt-draft";
import { SI_UNITS } from "@/lib/units";

afterEach(cleanup);

describe("a melt form's messages", () => {
  it("go from a field as soon as it is corrected, and stay on the fields not yet touched", () => {
    const client = new QueryClient();
    const wrapper = ({ children }: { children: ReactNode }) => (
      <QueryClientProvider client={client}>{children}</QueryClientProvider>
    );
    const { result } = renderHook(() => useMeltDraft({}, SI_UNITS), { wrapper });
    act(() => {
      result.current.set("pourTempC", "hot");
    });
    act(() => {
      result.current.check([]);
    });
    expect(Object.keys(result.current.errors)).toEqual(expect.arrayContaining(["pourTempC", "process", "alloy"]));

    act(() => {
      result.current.set("pourTempC", "735");
    });
    expect(result.current.errors.pourTempC).toBeUndefined();
    act(() => {
      result.current.set("process", "green-sand");
    });
    expect(result.current.errors.process).toBeUndefined();
    expect(result.current.errors.alloy).toBe("choose an alloy");
  });
});
