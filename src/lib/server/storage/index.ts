/**
 * The photo store of this process, chosen once from the environment (README: Configuration):
 * S3-compatible storage when STEAMWISP_S3_BUCKET is set, else local disk under
 * STEAMWISP_PHOTO_DIR (default `<data directory>/photos`).
 */
import { resolve } from 'node:path';
import { LocalDiskStore } from './disk';
import { S3Store } from './s3';
import type { PhotoStore } from './store';

export { photoKey, type PhotoStore, type StoredObject } from './store';
export { LocalDiskStore } from './disk';
export { S3Store } from './s3';

type Env = Record<string, string | undefined>;

export function storeFromEnv(env: Env): PhotoStore {
	const bucket = env.STEAMWISP_S3_BUCKET;
	if (bucket) {
		const endpoint = env.STEAMWISP_S3_ENDPOINT || undefined;
		const keyId = env.STEAMWISP_S3_ACCESS_KEY_ID;
		const secret = env.STEAMWISP_S3_SECRET_ACCESS_KEY;
		const pathStyle = env.STEAMWISP_S3_FORCE_PATH_STYLE;
		// Half a key pair would silently fall back to whatever AWS_* credentials the host has.
		if (!keyId !== !secret) {
			throw new Error(
				'Set both STEAMWISP_S3_ACCESS_KEY_ID and STEAMWISP_S3_SECRET_ACCESS_KEY, or neither'
			);
		}
		if (pathStyle !== undefined && pathStyle !== 'true' && pathStyle !== 'false') {
			throw new Error(`STEAMWISP_S3_FORCE_PATH_STYLE must be true or false, not "${pathStyle}"`);
		}
		return new S3Store(bucket, {
			region: env.STEAMWISP_S3_REGION || 'us-east-1',
			...(endpoint ? { endpoint } : {}),
			forcePathStyle: pathStyle === undefined ? endpoint !== undefined : pathStyle === 'true',
			...(keyId && secret ? { credentials: { accessKeyId: keyId, secretAccessKey: secret } } : {})
		});
	}
	const data = env.STEAMWISP_DATA_DIR || resolve('.data');
	return new LocalDiskStore(resolve(env.STEAMWISP_PHOTO_DIR || `${data}/photos`));
}

let current: PhotoStore | null = null;

export function photoStore(): PhotoStore {
	current ??= storeFromEnv(process.env);
	return current;
}
