package com.wayledger.system;

import java.util.Map;
import java.util.concurrent.ConcurrentHashMap;
import org.springframework.beans.factory.ObjectProvider;
import org.springframework.web.servlet.resource.ResourceUrlProvider;

/**
 * The public URL of a static asset ({@code /css/wayledger.css} becomes {@code
 * /css/wayledger-<md5>.css}), worked out once per asset and kept. Templates ask for it by name
 * ({@code @{${@assets.url('/css/wayledger.css')}}}) instead of letting a response filter rewrite
 * every link of every page: the rewriting filter is switched off ({@code
 * spring.web.resources.chain.enabled=false}), so page links cost nothing beyond building them.
 */
public class AssetUrls {

  private final ObjectProvider<ResourceUrlProvider> resources;
  private final Map<String, String> known = new ConcurrentHashMap<>();

  /** Declared by {@link StaticAssets} as the bean {@code assets}. */
  AssetUrls(ObjectProvider<ResourceUrlProvider> resources) {
    this.resources = resources;
  }

  public String getCss() {
    return url("/css/wayledger.css");
  }

  public String getIcon() {
    return url("/favicon.svg");
  }

  public String getHtmx() {
    return url("/webjars/htmx.org/dist/htmx.min.js");
  }

  /** The content-hashed or versioned path of an asset; the path itself when none is known. */
  public String url(String path) {
    String found = known.get(path);
    if (found == null) {
      ResourceUrlProvider provider = resources.getIfAvailable();
      String resolved = provider == null ? null : provider.getForLookupPath(path);
      found = resolved == null ? path : resolved;
      if (resolved != null) {
        known.put(path, found);
      }
    }
    return found;
  }
}
