// The package ships no types; this is the one function we use.
declare module 'swagger-ui-dist' {
  const swaggerUiDist: { getAbsoluteFSPath(): string };
  export default swaggerUiDist;
}
