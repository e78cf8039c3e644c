// `npm run photos:to-object-store`: the one-time move of photos from the server's disk (UPLOAD_DIR, the
// old layout) into the object store (S3_*). Safe to run again: what is already in the store is skipped.
// Local database and store as scripts/with-local-services.ts says.
import { movePhotosToObjectStore } from "../server/photos/move-to-store";
import { withLocalServices } from "./with-local-services";

await withLocalServices(async () => {
  const report = await movePhotosToObjectStore(console.log);
  console.log(
    `${report.moved.length} file(s) moved into the store, ${report.alreadyInStore.length} already there, ` +
      `${report.missing.length} missing from both.`,
  );
});
