import { NotBuiltYet } from "@/components/not-built-yet";

export default function RulebookScreen() {
  return (
    <NotBuiltYet
      title="Rulebook"
      purpose="What the shop knows about causes and fixes: the rules behind each diagnosis, where each one comes from, and how often it was right here."
    />
  );
}
