/**
 * The rear camera for reading tags, and what to tell the auditor when it cannot be had.
 * The messages end in what to do next; typing the tag always works.
 */

/** The rear camera's picture (the user-facing one where there is no other). */
export async function openRearCamera(): Promise<MediaStream> {
	if (!globalThis.navigator?.mediaDevices?.getUserMedia) {
		throw new DOMException('No camera interface', 'NotSupportedError');
	}
	return navigator.mediaDevices.getUserMedia({
		audio: false,
		video: { facingMode: 'environment', width: { ideal: 1280 }, height: { ideal: 720 } }
	});
}

/** Turns the camera off (its light goes out), whatever state the stream is in. */
export function stopCamera(stream: MediaStream | null | undefined): void {
	for (const track of stream?.getTracks() ?? []) track.stop();
}

/** Why the camera could not be used, in plain words, from getUserMedia's error. */
export function cameraProblem(error: unknown): string {
	const name = error instanceof Error || error instanceof DOMException ? error.name : '';
	switch (name) {
		case 'NotAllowedError':
		case 'PermissionDeniedError':
			return 'The camera was not allowed. To scan, allow the camera for Steamwisp in the browser’s site settings; or type the tag.';
		case 'NotFoundError':
		case 'OverconstrainedError':
		case 'DevicesNotFoundError':
			return 'This device has no camera the browser can use. Type the tag instead.';
		case 'NotReadableError':
		case 'TrackStartError':
		case 'AbortError':
			return 'The camera is busy (another app may be using it). Close that app and try again, or type the tag.';
		case 'SecurityError':
		case 'NotSupportedError':
			return 'This browser cannot use the camera here (it needs a secure https connection). Type the tag instead.';
		default:
			return 'The camera could not be started. Type the tag instead.';
	}
}

/** Why the code reader could not be loaded. */
export const READER_PROBLEM =
	'The code reader could not be loaded on this device. Type the tag instead.';
