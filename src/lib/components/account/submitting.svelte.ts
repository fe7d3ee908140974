import type { SubmitFunction } from '@sveltejs/kit';

/**
 * `use:enhance` with a busy flag: the button says it is working and cannot be pressed twice;
 * typed values stay in place when the server sends the form back with a problem. `before` runs
 * once the server has answered with a redirect, before the page follows it.
 */
export function submitting(before?: () => Promise<void>) {
	let busy = $state(false);
	const submit: SubmitFunction = () => {
		busy = true;
		return async ({ result, update }) => {
			if (before && result.type === 'redirect') await before();
			await update({ reset: false });
			busy = false;
		};
	};
	return {
		get busy() {
			return busy;
		},
		submit
	};
}
