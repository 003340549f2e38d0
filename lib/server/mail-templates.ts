export function signInEmail(link: string) {
  return {
    subject: "Your Echoline sign-in link",
    text: `Sign in to Echoline with this link (valid for 24 hours, once):\n\n${link}\n\nIf you did not ask for it, ignore this e-mail.`,
    html: `<p>Sign in to Echoline with this link (valid for 24 hours, once):</p><p><a href="${link}">Sign in to Echoline</a></p><p>If you did not ask for it, ignore this e-mail.</p>`,
  };
}

export function invitationEmail(link: string, role: string, inviter: string) {
  return {
    subject: "You are invited to Echoline",
    text: `${inviter} invited you to Echoline as ${role}.\n\nChoose your password here (valid for 7 days):\n\n${link}\n\nYou can also sign in with an e-mail link at any time.`,
    html: `<p>${inviter} invited you to Echoline as <strong>${role}</strong>.</p><p><a href="${link}">Choose your password</a> (valid for 7 days).</p><p>You can also sign in with an e-mail link at any time.</p>`,
  };
}
