import type { SubmitFunction } from '@sveltejs/kit';

/**
 * `use:enhance` with a busy flag for the Desk's forms. An "add" form empties after it worked
 * (`clearOnSuccess`) so the next entry starts fresh; an edit form keeps what is shown. After a
 * refusal every form keeps what was typed.
 */
export function busyForm({ clearOnSuccess = false } = {}) {
	let busy = $state(false);
	const submit: SubmitFunction = () => {
		busy = true;
		return async ({ update }) => {
			await update({ reset: clearOnSuccess });
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
