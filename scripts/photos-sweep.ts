// `npm run photos:sweep`: removes from the photo store every object no photo row names and older than
// ORPHAN_PHOTO_GRACE_MINUTES (server/photos/orphan-sweep.ts); every server also does this when it starts.
// Local database and store as scripts/with-local-services.ts says.
import { sweepOrphanPhotos } from "../server/photos/orphan-sweep";
import { withLocalServices } from "./with-local-services";

await withLocalServices(async () => {
  await sweepOrphanPhotos();
});
