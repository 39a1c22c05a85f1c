// next.config.mjs is plain JavaScript; tests read its headers.
declare module '@/next.config.mjs' {
  const config: import('next').NextConfig;
  export default config;
}
