/**
 * Compile-time proof that a zod schema and the engine type it stands for have not drifted
 * apart: `const _check: Agrees<typeof trapInputsSchema, TrapInputs> = true;` fails to compile
 * the moment either side gains, loses or changes a field.
 */
import type { z } from 'zod';

/** true when A and B are the same type (not merely assignable one way). */
export type Same<A, B> =
	(<G>() => G extends A ? 1 : 2) extends <G>() => G extends B ? 1 : 2
		? (<G>() => G extends B ? 1 : 2) extends <G>() => G extends A ? 1 : 2
			? true
			: false
		: false;

/** Flattens intersections and mapped types so structurally equal objects compare equal. */
type Plain<T> = T extends readonly (infer E)[]
	? Plain<E>[]
	: T extends object
		? { [K in keyof T]: Plain<T[K]> }
		: T;

/** true when the schema's parsed output is exactly the engine type T. */
export type Agrees<S extends z.ZodType, T> = Same<Plain<z.output<S>>, Plain<T>>;
