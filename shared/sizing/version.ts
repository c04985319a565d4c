/** Stored beside every saved result, so a figure can be traced to the model that gave it. */
export const ENGINE_VERSION = '2.0.0';
