/** Photos in S3-compatible object storage (@aws-sdk/client-s3); a PutObject is atomic. */
import {
	DeleteObjectCommand,
	GetObjectCommand,
	HeadObjectCommand,
	PutObjectCommand,
	S3Client,
	type S3ClientConfig
} from '@aws-sdk/client-s3';
import { assertKey, type PhotoStore, type StoredObject } from './store';

const missing = (e: unknown) => {
	const err = e as { name?: string; $metadata?: { httpStatusCode?: number } };
	return (
		err.name === 'NotFound' || err.name === 'NoSuchKey' || err.$metadata?.httpStatusCode === 404
	);
};

export class S3Store implements PhotoStore {
	readonly kind = 's3';
	private readonly client: S3Client;
	constructor(
		readonly bucket: string,
		config: S3ClientConfig
	) {
		this.client = new S3Client(config);
	}

	async has(key: string): Promise<boolean> {
		assertKey(key);
		try {
			await this.client.send(new HeadObjectCommand({ Bucket: this.bucket, Key: key }));
			return true;
		} catch (e) {
			if (missing(e)) return false;
			throw e;
		}
	}

	async put(key: string, bytes: Uint8Array, contentType: string): Promise<void> {
		assertKey(key);
		await this.client.send(
			new PutObjectCommand({
				Bucket: this.bucket,
				Key: key,
				Body: bytes,
				ContentType: contentType,
				ContentLength: bytes.byteLength
			})
		);
	}

	async get(key: string): Promise<StoredObject | null> {
		assertKey(key);
		try {
			const out = await this.client.send(new GetObjectCommand({ Bucket: this.bucket, Key: key }));
			if (!out.Body) return null;
			return {
				bytes: out.ContentLength ?? 0,
				contentType: out.ContentType ?? 'application/octet-stream',
				body: out.Body.transformToWebStream() as ReadableStream<Uint8Array>
			};
		} catch (e) {
			if (missing(e)) return null;
			throw e;
		}
	}

	async delete(key: string): Promise<void> {
		assertKey(key);
		await this.client.send(new DeleteObjectCommand({ Bucket: this.bucket, Key: key }));
	}
}
