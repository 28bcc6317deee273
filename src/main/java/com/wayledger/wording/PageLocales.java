package com.wayledger.wording;

import com.wayledger.account.InterfaceLanguage;
import com.wayledger.account.UserLanguages;
import com.wayledger.engine.rules.RuleSets;
import jakarta.servlet.RequestDispatcher;
import jakarta.servlet.http.HttpServletRequest;
import jakarta.servlet.http.HttpServletResponse;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import org.springframework.stereotype.Component;
import org.springframework.web.servlet.LocaleResolver;

/**
 * The one place that decides which words a page is written in, in this order:
 *
 * <ol>
 *   <li>the signed-in user's interface language, when it is English (UK) or English (US);
 *   <li>else, on a page about a site, the site's rule set: en-US for the NEC set, en-GB for the IEC
 *       set;
 *   <li>else the browser's Accept-Language, between en-GB and en-US;
 *   <li>else en-GB, the base bundles' language.
 * </ol>
 *
 * Spring asks again at render time, after the controller ran; the answer is kept on the request so
 * that a page, its fragments, its error page and its export all read the same words.
 */
@Component("localeResolver")
public class PageLocales implements LocaleResolver {

  /** The base bundles' language, and the answer when nothing else decides. */
  public static final Locale DEFAULT = Locale.UK;

  private static final List<Locale> SUPPORTED = List.of(Locale.UK, Locale.US);
  private static final String DECIDED = PageLocales.class.getName() + ".decided";

  private final UserLanguages languages;
  private final SiteOfPage sites;

  PageLocales(UserLanguages languages, SiteOfPage sites) {
    this.languages = languages;
    this.sites = sites;
  }

  @Override
  public Locale resolveLocale(HttpServletRequest request) {
    if (request.getAttribute(DECIDED) instanceof Locale decided) {
      return decided;
    }
    Locale locale = decide(request);
    request.setAttribute(DECIDED, locale);
    return locale;
  }

  /** The locale is decided for each request, never set from outside. */
  @Override
  public void setLocale(HttpServletRequest request, HttpServletResponse response, Locale locale) {
    throw new UnsupportedOperationException(
        "the interface language is chosen on the account page, not set per request");
  }

  private Locale decide(HttpServletRequest request) {
    Optional<Locale> chosen =
        Optional.ofNullable(request.getRemoteUser())
            .flatMap(languages::of)
            .map(InterfaceLanguage::locale);
    if (chosen.isPresent()) {
      return chosen.get();
    }
    Optional<String> ruleSet = sites.ruleSetOf(pagePath(request));
    if (ruleSet.isPresent()) {
      return forRuleSet(ruleSet.get());
    }
    return fromBrowser(request.getHeader("Accept-Language"));
  }

  /** The words of a site's pages under "follow the site": en-US for the NEC set, else en-GB. */
  static Locale forRuleSet(String ruleSetKey) {
    return RuleSets.NEC.key().equals(ruleSetKey) ? Locale.US : Locale.UK;
  }

  /** The better of en-GB and en-US for an Accept-Language header; en-GB when neither is named. */
  static Locale fromBrowser(String acceptLanguage) {
    if (acceptLanguage == null || acceptLanguage.isBlank()) {
      return DEFAULT;
    }
    try {
      Locale best = Locale.lookup(Locale.LanguageRange.parse(acceptLanguage), SUPPORTED);
      return best != null ? best : DEFAULT;
    } catch (IllegalArgumentException unreadable) {
      return DEFAULT;
    }
  }

  /** The address the page is about: on an error page, the address that failed. */
  private static String pagePath(HttpServletRequest request) {
    Object failed = request.getAttribute(RequestDispatcher.ERROR_REQUEST_URI);
    String uri = failed instanceof String s ? s : request.getRequestURI();
    String context = request.getContextPath();
    return context != null && !context.isEmpty() && uri.startsWith(context)
        ? uri.substring(context.length())
        : uri;
  }
}
