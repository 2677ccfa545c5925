/** @type {import('next').NextConfig} */
const nextConfig = {
  // Tests build into their own folder so a running `npm start` is not disturbed.
  distDir: process.env.NEXT_DIST_DIR || '.next',
  serverExternalPackages: ['sequelize', 'sqlite3', 'pg', 'pg-hstore', 'umzug', 'nodemailer', 'bcryptjs'],
  poweredByHeader: false,
};
export default nextConfig;
