import { describe, expect, it, vi } from 'vitest';
import { cameraProblem, stopCamera } from './camera';

describe('cameraProblem', () => {
	it('says the camera was not allowed, and how to allow it', () => {
		const text = cameraProblem(new DOMException('Permission denied', 'NotAllowedError'));
		expect(text).toMatch(/not allowed/);
		expect(text).toMatch(/type the tag/);
	});

	it('tells a missing camera from a busy one and from an insecure page', () => {
		expect(cameraProblem(new DOMException('', 'NotFoundError'))).toMatch(/no camera/);
		expect(cameraProblem(new DOMException('', 'NotReadableError'))).toMatch(/busy/);
		expect(cameraProblem(new DOMException('', 'NotSupportedError'))).toMatch(/https/);
	});

	it('always offers typing the tag, whatever went wrong', () => {
		for (const e of [new Error('odd'), 'text', null, new DOMException('', 'AbortError')]) {
			expect(cameraProblem(e)).toMatch(/type the tag/i);
		}
	});
});

describe('stopCamera', () => {
	it('stops every track of the stream, and accepts no stream', () => {
		const tracks = [{ stop: vi.fn() }, { stop: vi.fn() }];
		stopCamera({ getTracks: () => tracks } as unknown as MediaStream);
		for (const t of tracks) expect(t.stop).toHaveBeenCalledTimes(1);
		expect(() => stopCamera(null)).not.toThrow();
	});
});
