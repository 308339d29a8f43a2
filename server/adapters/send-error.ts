/**
 * Why a message could not be handed to the provider. "transient" may succeed later (retry with
 * back-off); "permanent" will fail the same way again (do not retry; record it and tell someone).
 */
export type SendErrorKind = "transient" | "permanent";
