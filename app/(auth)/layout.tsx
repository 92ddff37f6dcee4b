export default function AuthLayout({ children }: { children: React.ReactNode }) {
  return <div className="mx-auto mt-6 w-full max-w-md sm:mt-12">{children}</div>;
}
