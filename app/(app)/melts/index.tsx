import { NotBuiltYet } from "@/components/not-built-yet";

export default function MeltsScreen() {
  return (
    <NotBuiltYet
      title="Melts"
      purpose="The pour log: each melt with its alloy, charge, temperatures, degassing and mould conditions, and the castings poured from it."
    />
  );
}
