/** Text someone typed, ended with one full stop: "Core shot" and "Core shot." both read "Core shot.". */
export const asSentence = (text: string) => (/[.!?…]$/.test(text.trim()) ? text.trim() : `${text.trim()}.`);
