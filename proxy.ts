import { withAuth } from 'next-auth/middleware';

// Only redirects signed-out visitors to the sign-in page. Every page, route handler and action checks the
// session and the role itself.
export default withAuth({ pages: { signIn: '/sign-in' } });

export const config = {
  // The sign-in page and the pages single-use links open (invite, password reset) are for the signed-out.
  matcher: ['/((?!api|_next/static|_next/image|favicon.ico|sign-in|welcome/|reset-password/|forgot-password).*)'],
};
