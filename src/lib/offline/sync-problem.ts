/** What stopped an exchange, in plain words with what to do (shown by the sync status). */
export interface SyncProblem {
	kind: 'offline' | 'retry' | 'signed-out' | 'not-found' | 'bad-request' | 'rejected' | 'photo';
	/** true: try again later by itself (network, server trouble); false: a person must act. */
	retryable: boolean;
	message: string;
}

/** A problem from an HTTP status; 0 = no answer at all. */
export function problemFromStatus(status: number, surveyId?: string): SyncProblem {
	if (status === 0) {
		return {
			kind: 'offline',
			retryable: true,
			message: 'The server could not be reached; changes stay on this device and go later'
		};
	}
	if (status === 401) {
		return {
			kind: 'signed-out',
			retryable: false,
			message: 'Signed out: sign in again to send the changes kept on this device'
		};
	}
	if (status === 404 || status === 403) {
		return {
			kind: 'not-found',
			retryable: false,
			message:
				`You may no longer record on survey ${surveyId ?? ''}`.trim() +
				': ask the consultant; the changes stay on this device'
		};
	}
	// Too many requests, a timeout and server trouble pass by themselves; any other refusal
	// answers the same next time, so trying again on a timer would only repeat it.
	if (status >= 400 && status < 500 && status !== 408 && status !== 429) {
		return {
			kind: 'bad-request',
			retryable: false,
			message: `The server refused this exchange (${status}); the changes stay on this device`
		};
	}
	return {
		kind: 'retry',
		retryable: true,
		message: `The server had trouble (${status}); changes stay on this device and go later`
	};
}
