namespace SectionTwist.Rendering.Drawing;

/// <summary>Output format of a picture.</summary>
public enum ImageFormat
{
    /// <summary>Portable Network Graphics (raster).</summary>
    Png,
    /// <summary>Scalable Vector Graphics (text, vector).</summary>
    Svg,
}

/// <summary>Helpers for <see cref="ImageFormat"/>.</summary>
public static class ImageFormats
{
    /// <summary>The format implied by a file name's extension (<c>.png</c> or <c>.svg</c>).</summary>
    /// <exception cref="SectionTwistException">The extension is neither.</exception>
    public static ImageFormat FromPath(string path)
    {
        string ext = Path.GetExtension(path).ToLowerInvariant();
        return ext switch
        {
            ".png" => ImageFormat.Png,
            ".svg" => ImageFormat.Svg,
            _ => throw new SectionTwistException("picture-format",
                $"{path}: unknown picture type '{ext}'; name the file *.png or *.svg"),
        };
    }

    /// <summary>The MIME type, for data: URIs.</summary>
    public static string MimeType(this ImageFormat format) => format == ImageFormat.Svg ? "image/svg+xml" : "image/png";
}
