import sharp from "sharp";
import { newSid, TWILIO_API_VERSION } from "./twilio-format.ts";

/**
 * One attachment of a simulated MMS. `data: null` stands for media the provider no longer has
 * (its URL answers 404), so the app's handling of a failed download can be tried.
 */
export type FakeMedia = { contentType: string; data: Buffer | null };

type HostedMedia = { accountSid: string; messageSid: string; contentType: string; data: Buffer };

/**
 * Media of inbound texts, served the way Twilio serves them: under the REST API (so behind the
 * same HTTP Basic auth) at /2010-04-01/Accounts/{AC}/Messages/{SM}/Media/{ME}.
 */
export class MediaStore {
  private readonly items = new Map<string, HostedMedia>();

  /** Hosts the media (when it has bytes) and returns the URL Twilio would put in MediaUrlN. */
  host(baseUrl: string, accountSid: string, messageSid: string, media: FakeMedia): string {
    const mediaSid = newSid("ME");
    if (media.data) this.items.set(mediaSid, { accountSid, messageSid, contentType: media.contentType, data: media.data });
    return `${baseUrl}/${TWILIO_API_VERSION}/Accounts/${accountSid}/Messages/${messageSid}/Media/${mediaSid}`;
  }

  get(accountSid: string, messageSid: string, mediaSid: string): HostedMedia | undefined {
    const item = this.items.get(mediaSid);
    return item && item.accountSid === accountSid && item.messageSid === messageSid ? item : undefined;
  }

  clear(): void {
    this.items.clear();
  }
}

/**
 * A lawn-green sample photo as a phone would send it: a JPEG with the camera's make and a GPS
 * position in its EXIF, which the app must strip.
 */
export async function samplePhoto(): Promise<FakeMedia> {
  const data = await sharp({ create: { width: 800, height: 600, channels: 3, background: "#4f8a3c" } })
    .composite([{ input: Buffer.from('<svg width="800" height="600"><rect x="120" y="380" width="260" height="140" fill="#8a6a3c"/></svg>'), top: 0, left: 0 }])
    .jpeg()
    .withExif({
      IFD0: { Make: "FakePhone", Model: "Sproutline test" },
      IFD3: { GPSLatitudeRef: "N", GPSLatitude: "41/1 8/1 30/1", GPSLongitudeRef: "W", GPSLongitude: "81/1 30/1 0/1" },
    })
    .toBuffer();
  return { contentType: "image/jpeg", data };
}
