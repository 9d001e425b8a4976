// Types for comlink's Node adapter, which ships its declaration beside the .mjs under another name.
declare module 'comlink/dist/esm/node-adapter.mjs' {
  export { default } from 'comlink/dist/esm/node-adapter';
}
