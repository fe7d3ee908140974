/**
 * Names of people and companies, as every form takes them: trimmed, not blank, bounded, and
 * free of characters that change how the text around them is shown without being seen
 * themselves — bidirectional overrides, embeddings, isolates and marks (Unicode's Bidi_Control:
 * U+061C, U+200E, U+200F, U+202A–U+202E, U+2066–U+2069), line and paragraph separators
 * (U+2028, U+2029) and control characters (C0, DEL, C1). A name holding U+202E can show
 * "Okafor" while reading "rofakO", in a list, an e-mail subject or an audit trail.
 */
import { z } from 'zod';

const UNSAFE = /[\p{Bidi_Control}\p{Cc}\u2028\u2029]/u;

/** The first character a name must not hold, as "U+202E", or null when there is none. */
export function unsafeNameCharacter(text: string): string | null {
	const found = UNSAFE.exec(text)?.[0];
	if (found === undefined) return null;
	return `U+${found.codePointAt(0)!.toString(16).toUpperCase().padStart(4, '0')}`;
}

/** A required name of at most `max` characters; `label` starts the messages ("Your name"). */
export function nameSchema(max: number, missing: string, label: string) {
	return z
		.string({ error: missing })
		.trim()
		.min(1, { error: missing })
		.max(max, { error: `${label} must be at most ${max} characters` })
		.superRefine((name, ctx) => {
			const bad = unsafeNameCharacter(name);
			if (bad) {
				ctx.addIssue({
					code: 'custom',
					message: `${label} holds a hidden character (${bad}) that breaks the line or turns the text around; type it on one line, as it reads`
				});
			}
		});
}
