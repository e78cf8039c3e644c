import { Notice } from "@/components/ui/notice";
import { ChoiceChips } from "@/components/ui/choice-chips";
import { useNoticeSettings, useSaveNoticeSettings } from "@/hooks/use-people";
import type { NoticeSettings } from "@/lib/people-schemas";

const ON_OFF = [
  { value: "on", label: "Yes" },
  { value: "off", label: "No" },
];

/** Which e-mails a person gets; saved at each tap, like the units. */
export function NoticeChooser({ mentor }: { mentor: boolean }) {
  const settings = useNoticeSettings();
  const save = useSaveNoticeSettings();
  if (settings.error) return <Notice tone="error">{settings.error.message}</Notice>;
  if (!settings.data) return null;
  const current = save.isPending && save.variables ? save.variables : settings.data;
  const set = (change: Partial<NoticeSettings>) => save.mutate({ ...current, ...change });
  return (
    <>
      {mentor ? (
        <ChoiceChips
          label="E-mail me when someone asks for a review"
          options={ON_OFF}
          value={current.reviewRequested ? "on" : "off"}
          onChange={(v) => set({ reviewRequested: v === "on" })}
        />
      ) : null}
      <ChoiceChips
        label="E-mail me when a mentor answers on my casting"
        options={ON_OFF}
        value={current.causeConfirmed ? "on" : "off"}
        onChange={(v) => set({ causeConfirmed: v === "on" })}
      />
      {save.error ? <Notice tone="error">{save.error.message}</Notice> : null}
    </>
  );
}
