import { endpoint } from "@/lib/api/endpoint";
import { rememberDrive } from "@/lib/drives/current-drive-queries";
import { currentDriveInput } from "@/lib/drives/schemas";

export const dynamic = "force-dynamic";

// The drive the signed-in person works on, remembered for their membership in the
// acting group. No `resource`: the drive is named in the body, and rememberDrive's
// one statement filters it by the actor's group (another group's drive is 404).
export const PUT = endpoint({ who: "member", body: currentDriveInput }, async ({ actor, body }) => rememberDrive(actor, body.driveId));
