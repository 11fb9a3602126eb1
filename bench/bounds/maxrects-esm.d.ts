// The package's "main" is a UMD file inside a "type": "module" package, which Node and Vite load without exports;
// its ESM build loads fine by path and has the same types.
declare module 'maxrects-packer/dist/maxrects-packer.mjs' {
  export * from 'maxrects-packer';
}
