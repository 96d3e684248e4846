// Sends signed-out visitors of app pages to /sign-in. API routes answer 401 JSON themselves, and
// public pages (sign-in, health, client proposal links under /p/, team invitations under
// /invite/) stay open.
import { withAuth } from 'next-auth/middleware';

export default withAuth({
  pages: { signIn: '/sign-in' },
});

export const config = {
  matcher: [
    // Everything except: api routes, Next's assets, files with an extension, sign-in, and /p/ links.
    '/((?!api/|_next/|sign-in|p/|invite/|favicon\\.ico|.*\\.[A-Za-z0-9]+$).*)',
  ],
};
