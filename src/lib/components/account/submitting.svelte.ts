import type { SubmitFunction } from '@sveltejs/kit';

/**
 * `use:enhance` with a busy flag: the button says it is working and cannot be pressed twice;
 * typed values stay in place when the server sends the form back with a problem.
 */
export function submitting() {
	let busy = $state(false);
	const submit: SubmitFunction = () => {
		busy = true;
		return async ({ update }) => {
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
