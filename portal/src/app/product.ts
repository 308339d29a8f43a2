/** The portal's name in the header and in every tab title. */
export const productLabel = "Sproutline";
