import { NotBuiltYet } from "@/components/ui/not-built-yet";

export default function TrendsScreen() {
  return (
    <NotBuiltYet
      title="Trends"
      purpose="Defect and scrap rates over time and by superheat, process and alloy, and which fixes worked."
    />
  );
}
