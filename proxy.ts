import { withAuth } from 'next-auth/middleware';

// Only redirects signed-out visitors to the sign-in page. Every page, route handler and action checks the
// session and the role itself.
export default withAuth({ pages: { signIn: '/sign-in' } });

export const config = {
  matcher: ['/((?!api|_next/static|_next/image|favicon.ico|sign-in).*)'],
};
