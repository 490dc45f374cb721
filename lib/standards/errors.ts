/** Input the standards engine cannot work with: the message says why, in words a restorer can act on. */
export class StandardsInputError extends Error {}
