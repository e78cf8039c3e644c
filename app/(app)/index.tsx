import { NotBuiltYet } from "@/components/not-built-yet";

export default function CasebookScreen() {
  return (
    <NotBuiltYet
      title="Casebook"
      purpose="Every casting the shop has judged, searchable by words, defect, alloy, process, outcome and cause, with the cases most like the one in front of you."
    />
  );
}
