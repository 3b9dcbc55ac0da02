/** Native platforms draw focus themselves. */
export function installFocusStyle() {}
