/**
 * Version of the engine's methods. Stored beside every server-computed result, so results made
 * by an older method can be found and recomputed when a method changes. Bump it with any change
 * that moves a computed loss.
 */
export const ENGINE_VERSION = 'steamwisp-engine/1';
