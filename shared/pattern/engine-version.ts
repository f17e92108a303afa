/** Version of the layout rules; stored with every saved layout so old revisions stay explainable. */
export const ENGINE_VERSION = '1.0.0';
