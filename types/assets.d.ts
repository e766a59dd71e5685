declare module '*.ttf' {
  const src: number | string;
  export = src;
}
