import type { ComponentProps } from 'react';
import { Link } from 'react-router-dom';
import { cn } from './cn';

const textLinkClasses = 'font-bold text-brand underline underline-offset-4 hover:text-brand-strong';

export function TextLink({ className, ...props }: ComponentProps<typeof Link>) {
  return <Link className={cn(textLinkClasses, className)} {...props} />;
}
