import { PourLogImport } from "@/components/import/pour-log-import";
import { BackLink } from "@/components/ui/back-link";
import { Heading } from "@/components/ui/heading";
import { Notice } from "@/components/ui/notice";
import { Screen } from "@/components/ui/screen";
import { useShop } from "@/hooks/use-shop";
import { roleCan } from "@/lib/permissions";

/** The owner brings an old pour log into the casebook. */
export default function ImportScreen() {
  const shop = useShop();
  const mayImport = !!shop.data && roleCan(shop.data.role, { shop: ["import"] });
  return (
    <Screen>
      <BackLink href="/more" label="More" />
      <Heading>Import a pour log</Heading>
      {shop.data && !mayImport ? <Notice>Only the shop's owner can import a pour log.</Notice> : null}
      {mayImport ? <PourLogImport /> : null}
    </Screen>
  );
}
